// Serves the built web app (WEB_DIST_DIR) with an SPA fallback: any GET outside /api that is
// not a file gets index.html, so client-side routes survive a reload.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express from 'express';
import type { Express } from 'express';

export function serveWebApp(app: Express, distDir: string): void {
  const indexFile = join(distDir, 'index.html');
  app.use(express.static(distDir, { index: false, maxAge: '1h' }));
  app.get(/^(?!\/api(?:\/|$)).*/, (_req, res, next) => {
    if (!existsSync(indexFile)) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexFile);
  });
}
