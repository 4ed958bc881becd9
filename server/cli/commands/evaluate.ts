/**
 * `cli evaluate`: one design object (or an array of them) as JSON on stdin, the metrics (object or
 * array, same order) as JSON on stdout. A table element gives its pattern inline or as a file path. Bad input: UsageError, so exit 2 with one "field: rule" line.
 */
import { evaluateDesign } from '../../../shared/engine/index.ts';
import { DesignOrListSchema } from '../../../shared/schemas/design.ts';
import { formatIssue } from '../../../shared/schemas/format-issue.ts';
import { assertPatternsGiven, inlinePatternFiles } from '../pattern-files.ts';
import { readJsonStdin } from '../read-json-stdin.ts';
import { UsageError } from '../usage-error.ts';

export async function evaluateCommand(argv: string[]): Promise<number> {
  if (argv.length > 0) throw new UsageError(`evaluate takes no options (got "${argv[0]}"); pipe the design JSON on stdin`);
  const body = await readJsonStdin('a design object or an array of them');
  const parsed = DesignOrListSchema.safeParse(inlinePatternFiles(body));
  if (!parsed.success) throw new UsageError(formatIssue(parsed.error));
  assertPatternsGiven(Array.isArray(parsed.data) ? parsed.data : [parsed.data], Array.isArray(parsed.data));
  const out = Array.isArray(parsed.data) ? parsed.data.map(evaluateDesign) : evaluateDesign(parsed.data);
  process.stdout.write(`${JSON.stringify(out)}\n`);
  return 0;
}
