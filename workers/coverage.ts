/** Piscina worker thread: one coverage computation, parsed with the shared schema; a plain result back. */
import { computeCoverage, type CoverageResult } from '../shared/coverage/index.ts';
import { CoverageRequestSchema } from '../shared/schemas/coverage.ts';

export default function runCoverage(message: unknown): CoverageResult {
  return computeCoverage(CoverageRequestSchema.parse(message));
}
