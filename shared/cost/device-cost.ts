/**
 * A device (several modules) as one bill: cost, DC power and chips add up over its modules. Heat density is not
 * summed (W/cm² of different outlines do not add): the device reports its hottest module instead.
 */
import type { CostFigures } from './cost-of-design.ts';

export interface DeviceCost {
  costUsd: number;
  currency: string;
  /** null when any module's DC power is unknown, so a partial sum never reads as the whole. */
  dcPowerW: number | null;
  beamformerChips: number;
  boardAreaMm2: number;
  /** Highest module heat density, W/cm²; null when any is unknown. */
  maxHeatWPerCm2: number | null;
  modules: number;
}

export function deviceCost(modules: readonly CostFigures[]): DeviceCost {
  const currencies = new Set(modules.map((m) => m.currency));
  if (currencies.size > 1) throw new RangeError('modules priced in different currencies');
  const anyNull = (k: 'dcPowerW' | 'heatWPerCm2') => modules.some((m) => m[k] === null);
  return {
    costUsd: modules.reduce((s, m) => s + m.costUsd, 0),
    currency: modules[0]?.currency ?? 'USD',
    dcPowerW: anyNull('dcPowerW') ? null : modules.reduce((s, m) => s + m.dcPowerW!, 0),
    beamformerChips: modules.reduce((s, m) => s + m.beamformerChips, 0),
    boardAreaMm2: modules.reduce((s, m) => s + m.boardAreaMm2, 0),
    maxHeatWPerCm2: anyNull('heatWPerCm2') || modules.length === 0 ? null : Math.max(...modules.map((m) => m.heatWPerCm2!)),
    modules: modules.length,
  };
}
