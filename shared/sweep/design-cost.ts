/**
 * The cost columns of one sweep design: what the cost model reads of the design's summary (counts, aperture and
 * conducted power, none of which depend on prices) and the figures the study's current cost model makes of them.
 * The sweep writer and the re-pricing after a model save both go through here, so the two always agree.
 */
import { costOfDesign } from '../cost/cost-of-design.ts';
import type { CostModel } from '../cost/cost-model.ts';

export interface DesignCostInput {
  nx: number | null;
  ny: number | null;
  channels: number | null;
  apertureXMm: number | null;
  apertureYMm: number | null;
  conductedPowerDbm: number | null;
}

export interface DesignCostColumns {
  beamformerChips: number | null;
  costUsd: number | null;
  dcPowerW: number | null;
  heatWPerCm2: number | null;
}

const NONE: DesignCostColumns = { beamformerChips: null, costUsd: null, dcPowerW: null, heatWPerCm2: null };
const count = (v: number | null) => typeof v === 'number' && Number.isInteger(v) && v >= 0;
const size = (v: number | null) => typeof v === 'number' && Number.isFinite(v) && v >= 0;

/** All null without a model or when the design has no figures (none of its points evaluated). */
export function designCostColumns(input: DesignCostInput, model: CostModel | null): DesignCostColumns {
  const { nx, ny, channels, apertureXMm, apertureYMm } = input;
  if (!model || !count(nx) || !count(ny) || !count(channels) || !size(apertureXMm) || !size(apertureYMm)) return NONE;
  const c = costOfDesign(
    { nx: nx!, ny: ny! },
    { channels: channels!, apertureXMm: apertureXMm!, apertureYMm: apertureYMm!, conductedPowerDbm: input.conductedPowerDbm },
    model,
  );
  return { beamformerChips: c.beamformerChips, costUsd: c.costUsd, dcPowerW: c.dcPowerW, heatWPerCm2: c.heatWPerCm2 };
}
