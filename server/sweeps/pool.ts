/**
 * The thread pool that evaluates sweep chunks (piscina, sized to the cores unless SWEEP_THREADS says).
 * A thread that dies is replaced by piscina; the chunk it held is retried here a few times.
 *
 * The default worker is bundled once (esbuild, already present as tsx's compiler) into one plain ES module:
 * under tsx a worker thread would load the engine as CommonJS, where every imported binding is a getter call
 * in the hot loops (about 20 % slower) and each thread spends ~0.3 s compiling TypeScript on start.
 * The bundle is cached in the temp folder and rebuilt when any of its source files changes.
 */
import { createHash } from 'node:crypto';
import { mkdirSync, readFileSync, renameSync, statSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import type { DeviceSweepChunk } from '../../shared/devices/device-sweep-spec.ts';
import type { PointResult, SweepChunk } from '../../shared/sweep/chunk.ts';

export const DEFAULT_WORKER_FILE = fileURLToPath(new URL('../../workers/sweep.ts', import.meta.url));
const MAX_ATTEMPTS = 3;

export interface SweepPool {
  readonly threads: number;
  /** Evaluates one chunk; retries when the thread running it crashes. */
  run(chunk: SweepChunk): Promise<PointResult[]>;
  /** Computes variants of a device sweep (one coverage each), with the same retries. */
  runDevice(chunk: Omit<DeviceSweepChunk, 'kind'>): Promise<PointResult[]>;
  /** Evaluates one chunk into its `cli sweep` JSON lines (one string; cheap to pass between threads). */
  runLines(chunk: SweepChunk): Promise<string>;
  /** Attempts that failed and were retried, for logs and tests. */
  readonly retries: number;
  destroy(): Promise<void>;
}

/** The parent's flags minus the inspector; a bundled worker needs no TypeScript loader. */
export function workerExecArgv(bundled: boolean): string[] {
  const argv = process.execArgv.filter((a) => !a.startsWith('--inspect'));
  if (!bundled) return argv.some((a) => a.includes('tsx')) ? argv : [...argv, '--import', 'tsx'];
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if ((a === '--import' || a === '--require' || a === '--loader') && argv[i + 1]?.includes('tsx')) i++;
    else if (!a.includes('tsx')) out.push(a);
  }
  return out;
}

interface BundleManifest {
  inputs: [file: string, mtimeMs: number, size: number][];
}

function unchanged(manifest: BundleManifest): boolean {
  return manifest.inputs.every(([file, mtimeMs, size]) => {
    try {
      const s = statSync(file);
      return s.mtimeMs === mtimeMs && s.size === size;
    } catch {
      return false;
    }
  });
}

const bundles = new Map<string, string | null>();

/** Path of the bundled worker (the sweep worker unless `entry` says), or null when esbuild is not available (then threads use tsx). */
export function bundledWorkerFile(entry: string = DEFAULT_WORKER_FILE): string | null {
  const known = bundles.get(entry);
  if (known !== undefined) return known;
  bundles.set(entry, null);
  const done = (file: string | null) => {
    bundles.set(entry, file);
    return file;
  };
  let esbuild: typeof import('esbuild');
  try {
    esbuild = createRequire(import.meta.url)('esbuild') as typeof import('esbuild');
  } catch {
    return null;
  }
  const dir = path.join(os.tmpdir(), 'lobewise-sweep-worker');
  const stem = path.join(dir, createHash('sha1').update(entry).update(esbuild.version).digest('hex').slice(0, 16));
  const file = `${stem}.mjs`;
  try {
    const manifest = JSON.parse(readFileSync(`${stem}.json`, 'utf8')) as BundleManifest;
    statSync(file);
    if (unchanged(manifest)) return done(file);
  } catch {
    /* no usable cache: build below */
  }
  try {
    const root = path.resolve(path.dirname(entry), '..');
    const result = esbuild.buildSync({
      entryPoints: [entry], bundle: true, format: 'esm', platform: 'node', target: 'node20',
      write: false, metafile: true, logLevel: 'silent', absWorkingDir: root,
    });
    const inputs = Object.keys(result.metafile.inputs).map((f): BundleManifest['inputs'][number] => {
      const abs = path.resolve(root, f);
      const s = statSync(abs);
      return [abs, s.mtimeMs, s.size];
    });
    mkdirSync(dir, { recursive: true });
    // Write then rename, so a process starting meanwhile never loads half a file.
    const tmp = `${stem}.${process.pid}.tmp`;
    writeFileSync(tmp, result.outputFiles[0]!.contents);
    renameSync(tmp, file);
    writeFileSync(`${tmp}.json`, JSON.stringify({ inputs } satisfies BundleManifest));
    renameSync(`${tmp}.json`, `${stem}.json`);
    return done(file);
  } catch {
    return done(null);
  }
}

export function defaultThreads(): number {
  return Math.max(1, typeof os.availableParallelism === 'function' ? os.availableParallelism() : os.cpus().length);
}

export function createSweepPool(options: { threads?: number; filename?: string; onRetry?: (err: unknown) => void } = {}): SweepPool {
  const threads = options.threads ?? defaultThreads();
  const bundle = options.filename ? null : bundledWorkerFile();
  const piscina = new Piscina({
    filename: options.filename ?? bundle ?? DEFAULT_WORKER_FILE,
    minThreads: threads,
    maxThreads: threads,
    idleTimeout: 60_000,
    execArgv: workerExecArgv(bundle !== null),
  });
  let retries = 0;
  const attempt = async (chunk: SweepChunk | DeviceSweepChunk): Promise<unknown> => {
    for (let attempt = 1; ; attempt++) {
      try {
        return await piscina.run(chunk);
      } catch (err) {
        if (attempt >= MAX_ATTEMPTS) throw err;
        retries++;
        options.onRetry?.(err);
      }
    }
  };
  return {
    threads,
    run: async (chunk) => (await attempt({ ...chunk, output: 'rows' })) as PointResult[],
    runDevice: async (chunk) => (await attempt({ ...chunk, kind: 'device' })) as PointResult[],
    runLines: async (chunk) => (await attempt({ ...chunk, output: 'lines' })) as string,
    get retries() {
      return retries;
    },
    destroy: () => piscina.destroy(),
  };
}
