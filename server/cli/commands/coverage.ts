/**
 * `cli coverage`: a coverage request {modules, region, percentiles} as JSON on stdin, the coverage result
 * (peak, minimum, percentiles, CDF, map) as JSON on stdout. Bad input: UsageError, so exit 2 with one
 * "field: rule" line.
 */
import { computeCoverage } from '../../../shared/coverage/index.ts';
import { CoverageRequestSchema } from '../../../shared/schemas/coverage.ts';
import { formatIssue } from '../../../shared/schemas/format-issue.ts';
import { inlinePatternFiles } from '../pattern-files.ts';
import { readJsonStdin } from '../read-json-stdin.ts';
import { UsageError } from '../usage-error.ts';

/** Pattern file paths in modules' table elements become their values; errors name the module's field. */
function inlineModulePatterns(body: unknown): unknown {
  if (body === null || typeof body !== 'object' || !Array.isArray((body as { modules?: unknown }).modules)) return body;
  const modules = (body as { modules: unknown[] }).modules.map((m, i) => {
    if (m === null || typeof m !== 'object' || !('design' in m)) return m;
    try {
      return { ...m, design: inlinePatternFiles(m.design) };
    } catch (err) {
      if (err instanceof UsageError) throw new UsageError(`modules[${i}].design.${err.message}`);
      throw err;
    }
  });
  return { ...body, modules };
}

export async function coverageCommand(argv: string[]): Promise<number> {
  if (argv.length > 0) throw new UsageError(`coverage takes no options (got "${argv[0]}"); pipe the request JSON on stdin`);
  const body = await readJsonStdin('a coverage request {modules, region, percentiles}');
  const parsed = CoverageRequestSchema.safeParse(inlineModulePatterns(body));
  if (!parsed.success) throw new UsageError(formatIssue(parsed.error));
  parsed.data.modules.forEach((m, i) => {
    const e = m.design.element;
    if (e.kind === 'table' && !e.pattern) {
      throw new UsageError(`modules[${i}].design.element.patternId: no pattern "${e.patternId}" here; give element.pattern inline or as a file path (CSV azDeg,elDeg,gainDbi)`);
    }
  });
  process.stdout.write(`${JSON.stringify(computeCoverage(parsed.data))}\n`);
  return 0;
}
