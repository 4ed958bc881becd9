/** SESSION_SECRET from config, or one generated once and kept in DATA_DIR so restarts keep sessions. */
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { Config } from '../config.ts';

const FILE = 'session-secret';
let ephemeral: string | undefined;

export function resolveSessionSecret(config: Pick<Config, 'SESSION_SECRET' | 'DATA_DIR' | 'NODE_ENV'>): string {
  if (config.SESSION_SECRET) return config.SESSION_SECRET;
  // Tests must not write into the working copy's data folder.
  if (config.NODE_ENV === 'test') return (ephemeral ??= randomBytes(32).toString('hex'));
  const file = path.join(config.DATA_DIR, FILE);
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(config.DATA_DIR, { recursive: true });
  const secret = randomBytes(32).toString('hex');
  writeFileSync(file, `${secret}\n`, { mode: 0o600, flag: 'wx' });
  return secret;
}
