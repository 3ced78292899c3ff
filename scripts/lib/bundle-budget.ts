// The web build's weight per route: what the browser must download (gzip) to show a page on a
// first visit, read from Vite's manifest — the entry's static imports plus the route module's.
// Budgets hold the pages people open first (sign-in on a phone at a customer's gate) small, and
// keep heavy parts (the area editor, plan drawings, calendar, PDF preview) behind lazy routes.
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

interface ManifestChunk {
  file: string;
  imports?: string[];
  isEntry?: boolean;
  isDynamicEntry?: boolean;
}
type Manifest = Record<string, ManifestChunk>;

/**
 * gzip KB a route may weigh on a first visit; routes not listed get the default. Sign-in's
 * target is 150 KB; it weighs about 163.5 today (React 66, the router 29, zod 25,
 * react-hook-form 16, TanStack Query 11; each a single module that cannot be split), so the
 * budget holds it near where it is until the form stack gets lighter.
 */
export const routeBudgetsKb: Record<string, number> = {
  'src/app/routes/sign-in.tsx': 165,
};
export const defaultRouteBudgetKb = 400;

/** Every JS file `key` loads before it runs: itself and its static imports, transitively. */
function staticClosure(manifest: Manifest, key: string, seen = new Set<string>()): Set<string> {
  const chunk = manifest[key];
  if (!chunk || seen.has(key)) return seen;
  seen.add(key);
  for (const imported of chunk.imports ?? []) staticClosure(manifest, imported, seen);
  return seen;
}

export interface RouteWeight {
  route: string;
  kb: number;
  budgetKb: number;
}

/** The first-visit weight of every lazy route, largest first. */
export function routeWeights(distDir: string): RouteWeight[] {
  const manifestFile = join(distDir, '.vite', 'manifest.json');
  if (!existsSync(manifestFile)) throw new Error(`no ${manifestFile}: build the web app first`);
  const manifest = JSON.parse(readFileSync(manifestFile, 'utf8')) as Manifest;
  const entry = Object.keys(manifest).find((key) => manifest[key]?.isEntry);
  if (!entry) throw new Error('the manifest names no entry');
  const gzipKb = new Map<string, number>();
  const weigh = (key: string) => {
    const known = gzipKb.get(key);
    if (known !== undefined) return known;
    const file = manifest[key]?.file ?? '';
    const kb = file.endsWith('.js') ? gzipSync(readFileSync(join(distDir, file))).length / 1024 : 0;
    gzipKb.set(key, kb);
    return kb;
  };
  return Object.keys(manifest)
    .filter((key) => manifest[key]?.isDynamicEntry && key.startsWith('src/app/routes/'))
    .map((route) => {
      const files = staticClosure(manifest, entry, staticClosure(manifest, route));
      const kb = [...files].reduce((sum, key) => sum + weigh(key), 0);
      return { route, kb, budgetKb: routeBudgetsKb[route] ?? defaultRouteBudgetKb };
    })
    .sort((a, b) => b.kb - a.kb);
}
