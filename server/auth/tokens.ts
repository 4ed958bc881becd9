/** One-time link tokens and API tokens: random, shown once, stored only as a SHA-256 hash. */
import { createHash, randomBytes } from 'node:crypto';

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export function newToken(prefix = ''): { token: string; hash: string } {
  const token = `${prefix}${randomBytes(32).toString('base64url')}`;
  return { token, hash: hashToken(token) };
}
