/** A module's codebook from its rule: a grid of beams, or the fewest beams filling a region (engine helpers). */
import { fillRegionCodebook } from '../coverage/fill-region-codebook.ts';
import { parseGridSpec } from '../coverage/grid-codebook.ts';
import type { Beam } from '../schemas/coverage.ts';
import type { Design } from '../schemas/design.ts';
import type { CodebookRule } from '../schemas/device.ts';

export interface ModuleBeams {
  beams: Beam[];
  /** Fill rule only: the crossover reached (dB below the codebook peak) and whether it met the target. */
  crossoverDb: number | null;
  met: boolean | null;
}

export function moduleBeams(design: Design, rule: CodebookRule): ModuleBeams {
  if (rule.kind === 'grid') {
    const parsed = parseGridSpec(rule.grid);
    if ('problem' in parsed) throw new RangeError(parsed.problem);
    // Column grouping steers in azimuth only, row grouping in elevation only: drop what the module cannot point.
    const beams = parsed.beams.filter((b) => (design.grouping === 'column' ? b.elDeg === 0 : design.grouping === 'row' ? b.azDeg === 0 : true));
    return { beams: beams.length ? beams : [{ azDeg: 0, elDeg: 0 }], crossoverDb: null, met: null };
  }
  const region = { kind: 'sector' as const, azMinDeg: rule.azMinDeg, azMaxDeg: rule.azMaxDeg, elMinDeg: rule.elMinDeg, elMaxDeg: rule.elMaxDeg };
  const filled = fillRegionCodebook({ ...design, codes: null }, region, rule.crossoverDb);
  return { beams: filled.beams, crossoverDb: filled.crossoverDb, met: filled.met };
}
