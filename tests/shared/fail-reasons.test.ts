import { describe, expect, it } from 'vitest';
import { checkAgainstSheet } from '../../shared/targets/check.ts';
import type { DesignFigures } from '../../shared/targets/figures.ts';
import { designFailLines, failReasons } from '../../shared/trade/fail-reasons.ts';
import type { TradeDesign } from '../../shared/trade/trade-design.ts';

// Hand-picked figures; each margin below is worked out by hand from them.
const figures: DesignFigures = {
  apertureXMm: 21.4, apertureYMm: 5.35, channels: 16, peakEirpDbm: 27, edgeEirpDbm: 22.5, scanLossEdgeDb: 1.5,
  hpbwAzMinDeg: 8, hpbwAzMaxDeg: 36, hpbwElMinDeg: 90, hpbwElMaxDeg: 95, worstSllDb: -11.2, gratingLobeInScan: true,
  maxPointingErrorDeg: 0.4, scanAzMinDeg: -30, scanAzMaxDeg: 30, scanElMinDeg: 0, scanElMaxDeg: 0,
};

describe('failReasons', () => {
  it('names every failed limit with the figure, the requirement and the margin', () => {
    const check = checkAgainstSheet(figures, {
      maxChannels: 8, minEdgeEirpDbm: 24, maxSllDb: -13, hpbwAzDeg: { min: 10, max: 30 }, scanAzDeg: { min: -45, max: 45 },
      noGratingLobeInScan: true, maxPointingErrorDeg: 1,
    });
    const byKey = Object.fromEntries(failReasons(check).map((r) => [r.key, r]));
    expect(Object.keys(byKey).sort()).toEqual(['hpbwAzDeg', 'maxChannels', 'maxSllDb', 'minEdgeEirpDbm', 'noGratingLobeInScan', 'scanAzDeg']);
    // 16 channels against at most 8: 8 over.
    expect(byKey.maxChannels!.margin).toBe(8);
    expect(byKey.maxChannels!.text).toBe('16, needs at most 8: 8 over');
    // 22.5 dBm against at least 24 dBm: 1.5 dB short.
    expect(byKey.minEdgeEirpDbm!.margin).toBeCloseTo(1.5, 9);
    expect(byKey.minEdgeEirpDbm!.text).toBe('22.5 dBm, needs at least 24 dBm: 1.5 dB short');
    // -11.2 dB against at most -13 dB: 1.8 dB over.
    expect(byKey.maxSllDb!.margin).toBeCloseTo(1.8, 9);
    expect(byKey.maxSllDb!.text).toContain('1.8 dB over');
    // HPBW 8…36° against 10…30°: 2° under at the narrow end, 6° over at the wide end; the margin is the larger.
    expect(byKey.hpbwAzDeg!.margin).toBe(6);
    expect(byKey.hpbwAzDeg!.text).toBe('narrowest 8°, needs at least 10°: 2° under; widest 36°, needs at most 30°: 6° over');
    // Covers -30…30° of the needed -45…45°: 15° short.
    expect(byKey.scanAzDeg!.margin).toBe(15);
    expect(byKey.scanAzDeg!.text).toBe('covers -30…30°, needs -45…45°: 15° short');
    expect(byKey.noGratingLobeInScan!.margin).toBeNull();
    expect(byKey.noGratingLobeInScan!.text).toMatch(/grating lobe/);
  });

  it('is empty for a passing check and for no check', () => {
    expect(failReasons(checkAgainstSheet(figures, { maxChannels: 32 }))).toEqual([]);
    expect(failReasons(null)).toEqual([]);
  });

  it('a design none of whose points evaluated says so first', () => {
    const row = { designIndex: 1, params: {}, figures, points: 3, failedPoints: 3 } as unknown as TradeDesign;
    const lines = designFailLines(row, { maxChannels: 8 });
    expect(lines[0]).toMatch(/No steering angle/);
    expect(lines[1]).toBe('Max channels: 16, needs at most 8: 8 over');
    expect(designFailLines(row, null)).toEqual([]);
  });
});
