/** Hand-built trade rows for the component tests: every figure chosen here, none copied from the engine. */
import type { DesignFigures } from '../../shared/targets/figures.ts';
import type { TradeDesign } from '../../shared/trade/trade-design.ts';

const figures = (f: Partial<DesignFigures>): DesignFigures => ({
  apertureXMm: 21.4, apertureYMm: 5.35, channels: 4, peakEirpDbm: 27, edgeEirpDbm: 24, scanLossEdgeDb: 1.5,
  hpbwAzMinDeg: 26, hpbwAzMaxDeg: 36, hpbwElMinDeg: 90, hpbwElMaxDeg: 95, worstSllDb: -12, gratingLobeInScan: false,
  maxPointingErrorDeg: 2, scanAzMinDeg: -45, scanAzMaxDeg: 45, scanElMinDeg: 0, scanElMaxDeg: 0, ...f,
});

export function tradeRow(designIndex: number, f: Partial<DesignFigures> = {}, p: Partial<TradeDesign['params']> = {}): TradeDesign {
  return {
    designIndex,
    params: {
      frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, dyMm: 5.35, taperX: { kind: 'uniform' }, taperY: { kind: 'uniform' },
      phaseBits: 6, grouping: 'element', element: { kind: 'cosine', q: 1 }, channelPowerDbm: 10, ...p,
    },
    figures: figures(f),
    gratingLobeOnsetAzDeg: 90,
    gratingLobeOnsetElDeg: null,
    scanRangeDeg: 45,
    directivityMaxDbi: 9,
    points: 7,
    failedPoints: 0,
  };
}
