import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildProductionClient } from '../../server/client-build.ts';

describe('the client', () => {
  it('builds with Vite into an index.html with hashed assets and the shipped font', async () => {
    const outDir = mkdtempSync(path.join(os.tmpdir(), 'lobewise-client-'));
    try {
      // The path `npm start` and the browser journeys take, here under the test runner's NODE_ENV=test.
      await buildProductionClient(process.cwd(), outDir);
      const html = readFileSync(path.join(outDir, 'index.html'), 'utf8');
      expect(html).toMatch(/<script type="module" crossorigin src="\/assets\/index-[\w-]+\.js">/);
      const assets = readdirSync(path.join(outDir, 'assets'));
      // Work Sans ships with the app (no font download at run time).
      expect(assets.some((a) => /work-sans.*\.woff2$/.test(a))).toBe(true);
      expect(existsSync(path.join(outDir, 'favicon.svg'))).toBe(true);
      // Brotli and gzip copies beside each script, for the server to send as they are.
      const entry = /src="\/assets\/(index-[\w-]+\.js)"/.exec(html)?.[1];
      expect(assets).toContain(`${entry}.br`);
      expect(assets).toContain(`${entry}.gz`);
      // A production bundle: no AG Grid development checks, whose warning panel would cover the grid.
      const scripts = assets.filter((a) => a.endsWith('.js')).map((a) => readFileSync(path.join(outDir, 'assets', a), 'utf8'));
      expect(scripts.some((s) => s.includes('ag-overlay-error-panel'))).toBe(false);
      expect(process.env.NODE_ENV).toBe('test'); // put back after the build
    } finally {
      rmSync(outDir, { recursive: true, force: true });
    }
  }, 240_000);
});
