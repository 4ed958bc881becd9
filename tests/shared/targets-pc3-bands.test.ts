import { describe, expect, it } from 'vitest';
import { PC3_BANDS, PC3_BAND_IDS, pc3Band } from '../../shared/targets/pc3-bands.ts';
import { HANDSET_28GHZ, SMALL_CELL_39GHZ } from '../../shared/targets/presets.ts';
import { TargetSheetSchema } from '../../shared/targets/sheet.ts';

// Expected values, recalled from memory of 3GPP TS 38.101-2 (to be checked against the published tables):
// Table 6.2.1.3-1 (PC3 minimum peak EIRP): n257 22.4, n258 22.4, n260 20.6, n261 22.4 dBm.
// Table 6.2.1.3-3 (PC3 spherical coverage, EIRP at the 50th percentile): n257 11.5, n258 11.5, n260 8, n261 11.5 dBm.
const PEAK: Record<string, number> = { n257: 22.4, n258: 22.4, n260: 20.6, n261: 22.4 };
const P50: Record<string, number> = { n257: 11.5, n258: 11.5, n260: 8, n261: 11.5 };

describe('power-class-3 band values', () => {
  it('cover n257, n258, n260 and n261', () => {
    expect(PC3_BANDS.map((b) => b.band)).toEqual(['n257', 'n258', 'n260', 'n261']);
    expect(PC3_BAND_IDS).toEqual(['n257', 'n258', 'n260', 'n261']);
  });

  it('cite the table each value comes from and say it is recalled from memory', () => {
    for (const b of PC3_BANDS) {
      expect(b.minPeakEirp.table, b.band).toBe('3GPP TS 38.101-2 Table 6.2.1.3-1');
      expect(b.sphericalP50Eirp.table, b.band).toBe('3GPP TS 38.101-2 Table 6.2.1.3-3');
      expect(b.minPeakEirp.note).toMatch(/recalled from memory/);
      expect(b.sphericalP50Eirp.note).toMatch(/recalled from memory/);
    }
  });

  it('hold the values of the cited tables (exact, 0.1 dB steps as printed)', () => {
    for (const b of PC3_BANDS) {
      expect(b.minPeakEirp.dbm, `${b.band} peak`).toBeCloseTo(PEAK[b.band]!, 6);
      expect(b.sphericalP50Eirp.dbm, `${b.band} 50th percentile`).toBeCloseTo(P50[b.band]!, 6);
    }
    expect(pc3Band('n259')).toBeUndefined();
  });
});

describe('handset and small-cell presets', () => {
  it('put the n257 values on the handset sheet and no edge-of-scan EIRP floor', () => {
    const sheet = TargetSheetSchema.parse(HANDSET_28GHZ.sheet);
    expect(sheet.band).toBe('n257');
    expect(sheet.minPeakEirpDbm).toBe(PEAK.n257);
    expect(sheet.minCoverageP50EirpDbm).toBe(P50.n257);
    // The 50th-percentile figure is a spherical-coverage requirement, not an edge-of-scan one.
    expect(sheet.minEdgeEirpDbm ?? null).toBeNull();
    expect(HANDSET_28GHZ.sources.minCoverageP50EirpDbm?.note).toMatch(/Table 6\.2\.1\.3-3.*memory/);
    for (const band of PC3_BAND_IDS) expect(HANDSET_28GHZ.sources.minCoverageP50EirpDbm?.note).toContain(`${band}: ${P50[band]} dBm`);
    for (const band of PC3_BAND_IDS) expect(HANDSET_28GHZ.sources.minPeakEirpDbm?.note).toContain(`${band}: ${PEAK[band]} dBm`);
  });

  it('give the small cell a service sector and a minimum EIRP across it, both marked invented', () => {
    const sheet = TargetSheetSchema.parse(SMALL_CELL_39GHZ.sheet);
    expect(sheet.serviceSector).toEqual({ azMinDeg: -50, azMaxDeg: 50, elMinDeg: -10, elMaxDeg: 10 });
    expect(typeof sheet.minSectorEirpDbm).toBe('number');
    expect(SMALL_CELL_39GHZ.sources.serviceSector?.basis).toBe('invented');
    expect(SMALL_CELL_39GHZ.sources.minSectorEirpDbm?.basis).toBe('invented');
  });

  it('refuse a sector whose ends are reversed, naming the field', () => {
    const r = TargetSheetSchema.safeParse({ serviceSector: { azMinDeg: 10, azMaxDeg: -10, elMinDeg: -5, elMaxDeg: 5 } });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(['serviceSector', 'azMinDeg']);
  });
});
