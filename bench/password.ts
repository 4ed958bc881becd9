/** `npm run bench -- password`: time of one argon2id hash and one verify with the parameters sign-in uses. */
import { performance } from 'node:perf_hooks';
import { hashPassword, verifyPassword } from '../server/auth/password.ts';

const RUNS = 15;

async function median(fn: () => Promise<unknown>): Promise<number> {
  const ms: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t = performance.now();
    await fn();
    ms.push(performance.now() - t);
  }
  ms.sort((a, b) => a - b);
  return ms[Math.floor(RUNS / 2)]!;
}

export async function run(): Promise<void> {
  const config = { NODE_ENV: 'production' as const };
  const hash = await hashPassword(config, 'bench password 0123');
  const hashMs = await median(() => hashPassword(config, 'bench password 0123'));
  const verifyMs = await median(() => verifyPassword(config, hash, 'bench password 0123'));
  process.stdout.write(`argon2id (sign-in parameters), median of ${RUNS}: hash ${hashMs.toFixed(1)} ms, verify ${verifyMs.toFixed(1)} ms\n`);
}
