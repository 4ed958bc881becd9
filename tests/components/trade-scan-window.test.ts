import { describe, expect, it } from 'vitest';
import { queryString, scanWindowLabel, scanWindowParams } from '../../src/components/trade/trade-query.ts';
import { DesignsQuerySchema } from '../../shared/sweep/results-query.ts';

const serverParse = (qs: string) => DesignsQuerySchema.parse(Object.fromEntries(new URLSearchParams(qs)));

describe('the target sheet\'s scan range as the designs API\'s scan window', () => {
  it('sends both axes in a form the designs route reads back unchanged', () => {
    const sheet = { scanAzDeg: { min: -45, max: 45 }, scanElDeg: { min: -7.5, max: 30 } };
    const parsed = serverParse(queryString({ sort: [], ranges: {} }, 0, 100, scanWindowParams(sheet)));
    expect(parsed.scanAz).toEqual({ min: -45, max: 45 });
    expect(parsed.scanEl).toEqual({ min: -7.5, max: 30 });
    expect(scanWindowLabel(sheet)).toBe('az -45..45°, el -7.5..30°');
  });

  it('sends only the axes the sheet restricts, and nothing without a sheet', () => {
    expect(scanWindowParams({ scanAzDeg: { min: -60, max: 60 }, scanElDeg: null })).toEqual({ scanAz: '-60..60' });
    expect(scanWindowLabel({ scanElDeg: { min: 0, max: 20 } })).toBe('el 0..20°');
    expect(scanWindowParams(null)).toEqual({});
    expect(scanWindowLabel({})).toBeNull();
    const parsed = serverParse(queryString({ sort: [], ranges: {} }, 0, 100, scanWindowParams(null)));
    expect(parsed.scanAz).toBeUndefined();
  });
});
