/**
 * `cli evaluate`: one design object (or an array of them) as JSON on stdin, the metrics (object or
 * array, same order) as JSON on stdout. A table element gives its pattern inline or as a file path. Bad input: UsageError, so exit 2 with one "field: rule" line.
 */
import { evaluateDesign } from '../../../shared/engine/index.ts';
import { DesignOrListSchema } from '../../../shared/schemas/design.ts';
import { formatIssue } from '../../../shared/schemas/format-issue.ts';
import { assertPatternsGiven, inlinePatternFiles } from '../pattern-files.ts';
import { UsageError } from '../usage-error.ts';

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString('utf8');
}

export async function evaluateCommand(argv: string[]): Promise<number> {
  if (argv.length > 0) throw new UsageError(`evaluate takes no options (got "${argv[0]}"); pipe the design JSON on stdin`);
  const text = await readStdin();
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch (err) {
    const why = err instanceof Error ? err.message.split('\n')[0] : 'parse error';
    throw new UsageError(`input: must be JSON (a design object or an array of them): ${why}`);
  }
  const parsed = DesignOrListSchema.safeParse(inlinePatternFiles(body));
  if (!parsed.success) throw new UsageError(formatIssue(parsed.error));
  assertPatternsGiven(Array.isArray(parsed.data) ? parsed.data : [parsed.data], Array.isArray(parsed.data));
  const out = Array.isArray(parsed.data) ? parsed.data.map(evaluateDesign) : evaluateDesign(parsed.data);
  process.stdout.write(`${JSON.stringify(out)}\n`);
  return 0;
}
