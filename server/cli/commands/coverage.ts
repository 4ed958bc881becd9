/**
 * `cli coverage`: a coverage request {modules, region, percentiles} as JSON on stdin, the coverage result
 * (peak, minimum, percentiles, CDF, map) as JSON on stdout. Bad input: UsageError, so exit 2 with one
 * "field: rule" line.
 */
import { computeCoverage } from '../../../shared/coverage/index.ts';
import { CoverageRequestSchema } from '../../../shared/schemas/coverage.ts';
import { formatIssue } from '../../../shared/schemas/format-issue.ts';
import { UsageError } from '../usage-error.ts';

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString('utf8');
}

export async function coverageCommand(argv: string[]): Promise<number> {
  if (argv.length > 0) throw new UsageError(`coverage takes no options (got "${argv[0]}"); pipe the request JSON on stdin`);
  const text = await readStdin();
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch (err) {
    const why = err instanceof Error ? err.message.split('\n')[0] : 'parse error';
    throw new UsageError(`input: must be JSON (a coverage request {modules, region, percentiles}): ${why}`);
  }
  const parsed = CoverageRequestSchema.safeParse(body);
  if (!parsed.success) throw new UsageError(formatIssue(parsed.error));
  process.stdout.write(`${JSON.stringify(computeCoverage(parsed.data))}\n`);
  return 0;
}
