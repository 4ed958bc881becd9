/**
 * The cost-and-power figures of one design (one module) under a study's cost model. Pure and transparent: every
 * figure is a sum of model inputs times counts the engine already reports, and the parts are returned too.
 */
import { beamformerChips } from './beamformer-chips.ts';
import { boardAreaMm2 } from './board-area-mm2.ts';
import type { CostModel } from './cost-model.ts';
import { dcPowerW } from './dc-power-w.ts';
import { heatWPerCm2 } from './heat-w-per-cm2.ts';
import { dbmToW, paDcPowerW } from './pa-dc-power-w.ts';

/** What the model reads of a design (the engine's Design satisfies it). */
export interface CostDesign {
  nx: number;
  ny: number;
}
/** What the model reads of the engine's metrics; conductedPowerDbm is null without a channel power. */
export interface CostMetrics {
  channels: number;
  apertureXMm: number;
  apertureYMm: number;
  conductedPowerDbm?: number | null;
}

export interface CostBreakdown {
  chips: number;
  elements: number;
  board: number;
  module: number;
  /** Average PA draw (duty cycle applied), W; null without a conducted power. */
  paW: number | null;
  /** Per-channel plus per-chip overheads, W. */
  overheadW: number;
}

export interface CostFigures {
  /** Module cost in `currency` (the field keeps its contract name whatever the currency). */
  costUsd: number;
  currency: string;
  beamformerChips: number;
  boardAreaMm2: number;
  /** Average DC draw, W; null when the design has no channel power (the PAs cannot be counted). */
  dcPowerW: number | null;
  /** Dissipated W per cm² of the module outline; null like dcPowerW. */
  heatWPerCm2: number | null;
  breakdown: CostBreakdown;
}

export function costOfDesign(design: CostDesign, metrics: CostMetrics, model: CostModel): CostFigures {
  const chips = beamformerChips(metrics.channels, model.channelsPerChip);
  const area = boardAreaMm2(metrics.apertureXMm, metrics.apertureYMm, model.boardMarginMm);
  const breakdown: CostBreakdown = {
    chips: chips * model.chipPrice,
    elements: design.nx * design.ny * model.elementPrice,
    board: area * model.boardPricePerMm2,
    module: model.modulePrice,
    paW: null,
    overheadW: metrics.channels * model.channelOverheadW + chips * model.chipOverheadW,
  };
  const costUsd = breakdown.chips + breakdown.elements + breakdown.board + breakdown.module;
  const conducted = metrics.conductedPowerDbm;
  let dc: number | null = null;
  let heat: number | null = null;
  if (typeof conducted === 'number' && Number.isFinite(conducted)) {
    const pa = paDcPowerW(conducted, model.paEfficiency);
    dc = dcPowerW({
      paDcPowerW: pa,
      channels: metrics.channels,
      chips,
      channelOverheadW: model.channelOverheadW,
      chipOverheadW: model.chipOverheadW,
      txDutyCycle: model.txDutyCycle,
    });
    breakdown.paW = model.txDutyCycle * pa;
    heat = heatWPerCm2(dc, model.txDutyCycle * dbmToW(conducted), area);
  }
  return { costUsd, currency: model.currency, beamformerChips: chips, boardAreaMm2: area, dcPowerW: dc, heatWPerCm2: heat, breakdown };
}
