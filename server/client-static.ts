/**
 * Serves the built client. The build writes brotli and gzip copies beside each asset (vite.config.ts), so a
 * request gets the smallest copy its Accept-Encoding allows with no compression work per request.
 * Files under /assets/ carry a content hash in their names, so browsers may keep them for a year without asking
 * again; index.html (and anything else unhashed) is revalidated on every load so a new build shows at once.
 */
import type { ServerResponse } from 'node:http';
import path from 'node:path';
import type { Express } from 'express';
import expressStaticGzip from 'express-static-gzip';

export const HASHED_ASSET_CACHE = 'public, max-age=31536000, immutable';
export const REVALIDATE = 'no-cache';

function cacheHeaders(res: ServerResponse, file: string): void {
  const hashed = file.split(path.sep).includes('assets');
  res.setHeader('Cache-Control', hashed ? HASHED_ASSET_CACHE : REVALIDATE);
}

export function serveClient(app: Express, clientDir: string): void {
  app.use(
    expressStaticGzip(clientDir, {
      enableBrotli: true,
      orderPreference: ['br', 'gzip'],
      index: false,
      serveStatic: { index: false, cacheControl: false, setHeaders: cacheHeaders },
    }),
  );
  // History-mode routes: every non-API GET gets the client, which shows its own 404 page.
  const index = path.join(clientDir, 'index.html');
  app.get(/^(?!\/api\/).*/, (_req, res) => res.sendFile(index, { cacheControl: false, headers: { 'Cache-Control': REVALIDATE } }));
}
