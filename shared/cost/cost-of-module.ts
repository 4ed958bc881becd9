/**
 * A module's cost figures straight from its design, without a full evaluation: the counts and aperture the engine
 * reports (channels by grouping, nx·dx by ny·dy) and the engine's own conducted power (gain/conducted-power-dbm).
 * The devices page prices its modules with it; a sweep prices from the metrics it already has.
 */
import { conductedPowerDbm } from '../engine/gain/conducted-power-dbm.ts';
import { channelCount, type Design } from '../schemas/design.ts';
import { costOfDesign, type CostFigures } from './cost-of-design.ts';
import type { CostModel } from './cost-model.ts';

export function costOfModule(design: Design, model: CostModel): CostFigures {
  return costOfDesign(
    design,
    {
      channels: channelCount(design.grouping, design.nx, design.ny),
      apertureXMm: design.nx * design.dxMm,
      apertureYMm: design.ny * design.dyMm,
      conductedPowerDbm: conductedPowerDbm(design),
    },
    model,
  );
}
