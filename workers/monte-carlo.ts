/** Piscina worker thread: one chunk of a Monte Carlo run, parsed with the shared schema; plain results back. */
import { MonteCarloChunkSchema } from '../shared/bench/monte-carlo-chunk.ts';
import { monteCarloTrials, type TrialResult } from '../shared/bench/monte-carlo-trials.ts';

export default function runChunk(message: unknown): TrialResult[] {
  const chunk = MonteCarloChunkSchema.parse(message);
  return monteCarloTrials(chunk.design, chunk.options, chunk.ideal, chunk.start, chunk.count);
}
