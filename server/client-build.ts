/** `npm start` builds the client only when a source file is newer than the last build. */
import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';

const SOURCES = ['src', 'shared', 'index.html', 'vite.config.ts', 'package-lock.json'];

function newestMtime(target: string): number {
  if (!existsSync(target)) return 0;
  const stat = statSync(target);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of readdirSync(target)) newest = Math.max(newest, newestMtime(path.join(target, entry)));
  return newest;
}

export function clientIsStale(root: string, outDir: string): boolean {
  const built = path.join(outDir, 'index.html');
  if (!existsSync(built)) return true;
  const builtAt = statSync(built).mtimeMs;
  return SOURCES.some((s) => newestMtime(path.join(root, s)) > builtAt);
}

export async function buildClientIfStale(root: string, outDir: string, log: (m: string) => void): Promise<void> {
  if (!clientIsStale(root, outDir)) return;
  log('building the client (sources changed since the last build)…');
  const { build } = await import('vite');
  // Always a production bundle, even when a test runner (NODE_ENV=test) asks for it: Vite would otherwise bake
  // NODE_ENV into the client, and libraries then ship their test-mode code (ant-design-vue's fixed select ids).
  await build({ root, mode: 'production', logLevel: 'warn', define: { 'process.env.NODE_ENV': JSON.stringify('production') }, build: { outDir, emptyOutDir: true } });
}
