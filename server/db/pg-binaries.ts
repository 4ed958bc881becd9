/** Finds PostgreSQL's server programs, installing Debian's package when running as root and they are absent. */
import { execFileSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';

const DEBIAN_ROOT = '/usr/lib/postgresql';

function onPath(program: string): string | null {
  for (const dir of (process.env.PATH ?? '').split(path.delimiter)) {
    if (dir && existsSync(path.join(dir, program))) return dir;
  }
  return null;
}

function inDebianLayout(): string | null {
  if (!existsSync(DEBIAN_ROOT)) return null;
  const versions = readdirSync(DEBIAN_ROOT)
    .filter((v) => existsSync(path.join(DEBIAN_ROOT, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions[0] ? path.join(DEBIAN_ROOT, versions[0], 'bin') : null;
}

/** The folder holding initdb and postgres; throws with install advice when there is none. */
export function findPgBinDir(): string {
  const found = onPath('initdb') && onPath('postgres') ? onPath('initdb') : inDebianLayout();
  if (found) return found;
  if (process.getuid?.() === 0) {
    process.stderr.write('PostgreSQL not found: installing Debian package "postgresql" with apt-get…\n');
    execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit' });
    execFileSync('apt-get', ['install', '-y', '-qq', 'postgresql'], {
      stdio: 'inherit',
      env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
    });
    const installed = inDebianLayout();
    if (installed) return installed;
  }
  throw new Error(
    'PostgreSQL server programs (initdb, postgres) were not found on PATH or under /usr/lib/postgresql/*/bin. ' +
      'Install them, e.g. `sudo apt-get install postgresql`, or set DATABASE_URL to an existing server.',
  );
}
