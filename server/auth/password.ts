/** argon2id hashing with the password rule shared by every form that sets a password. */
import argon2 from 'argon2';
import type { Config } from '../config.ts';

export const PASSWORD_MIN_LENGTH = 10;

// OWASP Password Storage Cheat Sheet, argon2id minimum: m = 19 MiB, t = 2, p = 1.
const STANDARD = { type: argon2.argon2id, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;
// Tests hash and verify hundreds of times; a cheap parameter set keeps them fast. Never used outside NODE_ENV=test.
const TEST_ONLY = { type: argon2.argon2id, memoryCost: 1024, timeCost: 1, parallelism: 1 } as const;

export function hashPassword(config: Pick<Config, 'NODE_ENV'>, plain: string): Promise<string> {
  return argon2.hash(plain, config.NODE_ENV === 'test' ? TEST_ONLY : STANDARD);
}

let dummyHash: Promise<string> | undefined;

/** Verifies; with a null hash (unknown user) it still does the work so timing does not reveal accounts. */
export async function verifyPassword(config: Pick<Config, 'NODE_ENV'>, hash: string | null, plain: string): Promise<boolean> {
  if (hash === null) {
    dummyHash ??= hashPassword(config, 'not-a-real-password');
    await argon2.verify(await dummyHash, plain).catch(() => false);
    return false;
  }
  return argon2.verify(hash, plain).catch(() => false);
}
