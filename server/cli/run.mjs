/**
 * `npm run cli -- <command>`: starts the command line from an esbuild bundle of server/cli/index.ts instead of
 * compiling TypeScript through tsx on every start (about 1 s of a short command's time). The bundle is split
 * per command, so `evaluate` loads the engine and zod and nothing of the sweep pool or the database layer.
 * It is cached in node_modules/.cache and rebuilt when any source file it was built from changes (or this
 * file, or esbuild's version), as the sweep worker bundle is (server/sweeps/pool.ts).
 *
 * TypeORM entities need the column types that TypeScript's decorators emit and esbuild does not write, so
 * server/entities stays out of the bundle: a command whose modules reach it (migrate) loads it through tsx,
 * registered only for that command.
 * Plain JavaScript so that starting it needs no TypeScript loader.
 */
import { createHash } from 'node:crypto';
import { mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const root = path.resolve(here, '../..');
const entry = path.join(here, 'index.ts');
/** Loaded through tsx, never bundled (decorator metadata). */
const UNBUNDLED = path.join(root, 'server', 'entities') + path.sep;

const require = createRequire(import.meta.url);

function unchanged(inputs) {
  for (const [file, mtimeMs, size] of inputs) {
    try {
      const s = statSync(file);
      if (s.mtimeMs !== mtimeMs || s.size !== size) return false;
    } catch {
      return false;
    }
  }
  return true;
}

/** esbuild plugin: keeps the entities external, and gives each module its own import.meta.url. */
const sourcePlugin = {
  name: 'lobewise-cli-sources',
  setup(build) {
    build.onResolve({ filter: /entities/ }, (args) => {
      const abs = path.resolve(args.resolveDir, args.path);
      return abs.startsWith(UNBUNDLED) ? { path: pathToFileURL(abs).href, external: true } : undefined;
    });
    // A bundled module would otherwise see the bundle's URL and resolve its neighbours (worker files, fonts) from there.
    build.onLoad({ filter: /\.ts$/ }, (args) => {
      if (args.path.includes(`${path.sep}node_modules${path.sep}`)) return undefined;
      const text = readFileSync(args.path, 'utf8');
      if (!text.includes('import.meta.url')) return undefined;
      return { contents: text.replaceAll('import.meta.url', JSON.stringify(pathToFileURL(args.path).href)), loader: 'ts' };
    });
  },
};

/** Names of the commands whose chunk (with what it imports) reaches an unbundled TypeScript module. */
function commandsNeedingTsx(metafile) {
  const outputs = metafile.outputs;
  const reaches = (file, seen = new Set()) => {
    if (seen.has(file)) return false;
    seen.add(file);
    // Dynamic imports are followed too: a command that loads the database later still needs tsx from the start.
    return (outputs[file]?.imports ?? []).some((i) => (i.external ? i.path.startsWith('file:') : reaches(i.path, seen)));
  };
  const names = [];
  for (const [file, out] of Object.entries(outputs)) {
    const name = /cli[\\/]commands[\\/]([\w-]+)\.ts$/.exec(out.entryPoint ?? '')?.[1];
    if (name && reaches(file)) names.push(name);
  }
  return names;
}

/** The bundle's entry file and the commands that need tsx, built or from the cache; null without esbuild. */
async function bundledEntry() {
  let esbuildVersion;
  try {
    esbuildVersion = require('esbuild/package.json').version;
  } catch {
    return null;
  }
  // Inside node_modules (the usual .cache folder) so that the packages the bundle leaves out resolve from there.
  const dir = path.join(root, 'node_modules', '.cache', 'lobewise-cli');
  const key = createHash('sha1').update(entry).update(esbuildVersion).update(readFileSync(fileURLToPath(import.meta.url))).digest('hex').slice(0, 16);
  const pointer = path.join(dir, `${key}.json`);
  try {
    const cached = JSON.parse(readFileSync(pointer, 'utf8'));
    if (unchanged(cached.inputs)) return cached;
  } catch {
    /* no usable cache: build below */
  }
  try {
    mkdirSync(dir, { recursive: true });
  } catch {
    return null; // nowhere to keep a bundle (read-only install): run the sources through tsx
  }
  // Each build gets its own folder, published by renaming the pointer file, so a process starting meanwhile
  // never loads half a build. What earlier builds left is removed once it is an hour old.
  const outdir = path.join(dir, `${key}-${Date.now().toString(36)}-${process.pid}`);
  let result;
  try {
    result = await require('esbuild').build({
      entryPoints: { index: entry },
      bundle: true, splitting: true, format: 'esm', platform: 'node', target: 'node20',
      packages: 'external', outdir, metafile: true, logLevel: 'silent', absWorkingDir: root,
      plugins: [sourcePlugin],
    });
  } catch {
    return null; // tsx then reports the error in the source as it always has
  }
  const inputs = Object.keys(result.metafile.inputs)
    .filter((f) => !f.startsWith('file:'))
    .map((f) => {
      const abs = path.resolve(root, f);
      const s = statSync(abs);
      return [abs, s.mtimeMs, s.size];
    });
  const tmp = `${pointer}.${process.pid}.tmp`;
  const built = { file: path.join(outdir, 'index.js'), tsx: commandsNeedingTsx(result.metafile), outdir, inputs };
  try {
    writeFileSync(tmp, JSON.stringify(built));
    renameSync(tmp, pointer);
  } catch {
    return built; // usable now, rebuilt next time
  }
  for (const name of readdirSync(dir)) {
    const old = path.join(dir, name);
    if (old === outdir || name === path.basename(pointer)) continue; // earlier builds and other versions' caches
    try {
      if (statSync(old).mtimeMs < Date.now() - 3600_000) rmSync(old, { recursive: true, force: true });
    } catch {
      /* another process removed it */
    }
  }
  return built;
}

const command = process.argv[2];
const bundle = await bundledEntry();
if (!bundle || bundle.tsx.includes(command)) {
  const { register } = await import('tsx/esm/api');
  register();
}
await import(pathToFileURL(bundle?.file ?? entry).href);
