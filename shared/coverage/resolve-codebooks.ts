import type { CoverageModule, ResolvedModule } from '../schemas/coverage.ts';
import { fillRegionCodebook, type FilledCodebook } from './fill-region-codebook.ts';

/** What a fill rule chose for a module: the crossover it reached against its target. */
export type FillOutcome = Omit<FilledCodebook, 'beams'>;

/** Every module with a beam list: lists and grids as given, fill rules expanded by fillRegionCodebook. */
export function resolveCodebooks(modules: readonly CoverageModule[]): { modules: ResolvedModule[]; fills: (FillOutcome | null)[] } {
  const fills: (FillOutcome | null)[] = [];
  const resolved = modules.map((m) => {
    if (Array.isArray(m.beams)) {
      fills.push(null);
      return { ...m, beams: m.beams };
    }
    const { beams, ...outcome } = fillRegionCodebook(m.design, m.beams.fill.region, m.beams.fill.crossoverDb);
    fills.push(outcome);
    return { ...m, beams };
  });
  return { modules: resolved, fills };
}
