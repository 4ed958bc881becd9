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
  await buildProductionClient(root, outDir);
}

/**
 * Always a production bundle, even when a test runner (NODE_ENV=test) asks for it: Vite would otherwise bake NODE_ENV
 * into the client (libraries then ship their test-mode code, such as ant-design-vue's fixed select ids), and it derives
 * `import.meta.env.DEV` from NODE_ENV whatever the mode, which would register AG Grid's development checks and their
 * on-grid warning panel. So NODE_ENV is production for the length of the build.
 */
export async function buildProductionClient(root: string, outDir: string): Promise<void> {
  const { build } = await import('vite');
  const nodeEnv = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    await build({ root, mode: 'production', logLevel: 'warn', define: { 'process.env.NODE_ENV': JSON.stringify('production') }, build: { outDir, emptyOutDir: true } });
  } finally {
    if (nodeEnv === undefined) delete process.env.NODE_ENV;
    else process.env.NODE_ENV = nodeEnv;
  }
}
