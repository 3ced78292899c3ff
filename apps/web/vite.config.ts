import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

/**
 * Vendor chunks. The pattern must match `node_modules/<pkg>/` exactly: pnpm's `.pnpm` folder
 * names contain other packages' names, so a loose match would pull the wrong files in.
 */
const vendorChunks: Array<[name: string, test: RegExp]> = [
  ['react', /node_modules[\\/](react|react-dom|scheduler)\//],
  ['router', /node_modules[\\/](react-router|react-router-dom|cookie|set-cookie-parser)\//],
  ['query', /node_modules[\\/]@tanstack\/(react-query|query-core)\//],
  ['table', /node_modules[\\/]@tanstack\/(react-table|table-core)\//],
  ['forms', /node_modules[\\/](react-hook-form|@hookform\/resolvers)\//],
  ['zod', /node_modules[\\/]zod\//],
];

export default defineConfig({
  plugins: [react(), tailwindcss()],
  server: {
    port: 5173,
    proxy: { '/api': { target: 'http://127.0.0.1:5170', changeOrigin: false } },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // dist/.vite/manifest.json: which chunks each route loads, for the size budget in npm test.
    manifest: true,
    rolldownOptions: {
      output: {
        codeSplitting: {
          groups: vendorChunks.map(([name, test]) => ({ name, test })),
        },
      },
    },
  },
});
