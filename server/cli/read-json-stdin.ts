import { UsageError } from './usage-error.ts';

/**
 * The whole of stdin parsed as JSON; text that is not JSON is a UsageError (exit 2) saying what was expected,
 * e.g. `input: must be JSON (a design object or an array of them): Unexpected token …`.
 */
export async function readJsonStdin(expected: string): Promise<unknown> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  try {
    return JSON.parse(Buffer.concat(chunks).toString('utf8'));
  } catch (err) {
    const why = err instanceof Error ? err.message.split('\n')[0] : 'parse error';
    throw new UsageError(`input: must be JSON (${expected}): ${why}`);
  }
}
