import { describe, expect, it } from 'vitest';
import { BANDS, bandsFor } from '../../shared/targets/bands.ts';
import { TARGET_PRESETS, findPreset } from '../../shared/targets/presets.ts';
import { LIMIT_KEYS, TargetSheetSchema } from '../../shared/targets/sheet.ts';

describe('target presets', () => {
  it('are valid target sheets', () => {
    for (const p of TARGET_PRESETS) expect(TargetSheetSchema.safeParse(p.sheet).success, p.id).toBe(true);
  });

  it('give a source note for every limit they set, naming a standard or saying invented', () => {
    for (const p of TARGET_PRESETS) {
      for (const key of LIMIT_KEYS) {
        if (p.sheet[key] == null) continue;
        const note = p.sources[key];
        expect(note, `${p.id}.${key}`).toBeDefined();
        if (note!.basis === 'standard') expect(note!.note).toMatch(/3GPP TS \d+\.\d+(-\d)? Table [\d.-]+.*memory/);
        else expect(note!.note).toMatch(/invented/);
      }
    }
  });

  it('hold the power-class-3 minimum peak EIRP on the handset sheet', () => {
    // 3GPP TS 38.101-2 Table 6.2.1.3-1, PC3 in n257/n261: 22.4 dBm (recalled from memory).
    expect(findPreset('handset-28ghz')?.sheet.minPeakEirpDbm).toBe(22.4);
    expect(findPreset('small-cell-39ghz')?.sources.minPeakEirpDbm?.basis).toBe('invented');
    expect(findPreset('nope')).toBeUndefined();
  });
});

describe('FR2 bands', () => {
  it('put 28 GHz in n257 and n261, and 39 GHz in n260', () => {
    // 3GPP TS 38.101-2 Table 5.2-1 (recalled from memory): n257 26.5-29.5, n261 27.5-28.35, n260 37-40 GHz.
    expect(bandsFor(28).map((b) => b.id).sort()).toEqual(['n257', 'n261']);
    expect(bandsFor(39).map((b) => b.id)).toEqual(['n260']);
    expect(bandsFor(33)).toEqual([]);
    for (const b of BANDS) expect(b.centreGHz).toBeGreaterThan(b.lowGHz);
  });
});
