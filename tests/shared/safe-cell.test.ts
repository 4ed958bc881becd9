/** Formula neutralisation rules (OWASP "CSV Injection": cells starting with = + - @ TAB CR are formulas). */
import { describe, expect, it } from 'vitest';
import { safeCell, safeText } from '../../shared/export/safe-cell.ts';
import { codesCsv } from '../../shared/bench/codes-csv.ts';

describe('safeText', () => {
  it('prefixes an apostrophe to text a spreadsheet would evaluate', () => {
    for (const s of ['=1+2', '+A1', '-2+3', '@SUM(A1:A2)', '\tcmd', '\r=1', '=HYPERLINK("http://x.test","y")']) {
      expect(safeText(s)).toBe(`'${s}`);
    }
  });
  it('leaves plain numbers and ordinary text alone', () => {
    for (const s of ['-30', '-30.25', '+1.5e3', '0', 'Handset module', 'taylor(25,4)', 'a=b', '']) expect(safeText(s)).toBe(s);
  });
  it('passes non-text values through', () => {
    expect(safeCell(-30)).toBe(-30);
    expect(safeCell(null)).toBe(null);
    expect(safeCell(true)).toBe(true);
  });
});

describe('bench codes CSV', () => {
  it('writes no cell that opens as a formula, whatever text reaches a row', () => {
    // The table's text today is warning codes; a row with hostile text stands for any text added later.
    const csv = codesCsv({
      header: { candidate: '=HYPERLINK("x")', frequencyGHz: 28, phaseBits: 6, phaseStepDeg: 5.625, attenuatorBits: null, attenuatorStepDb: null, grouping: 'element', nx: 1, ny: 1 },
      attenuation: null, channelElements: [[[0, 0]]],
      channels: 1, phaseBits: 6, calibrated: false, pointingThresholdDeg: null,
      rows: [{ azDeg: -30, elDeg: 0, codes: [49], peakAzDeg: -29.5, peakElDeg: 0, pointingErrorDeg: 0.5, hpbwAzDeg: 20, hpbwElDeg: 90, sllAzDb: null, sllElDb: null, warnings: [{ code: '=cmd|/c calc', message: 'x' }] as never }],
    });
    const lines = csv.trim().split('\n');
    // The header block's lines are comments that start with '#', so a hostile candidate name stays text there too.
    expect(lines.filter((l) => l.startsWith('#')).every((l) => !/^[=+\-@]/.test(l))).toBe(true);
    const cells = lines.filter((l) => !l.startsWith('#'))[1]!.split(',');
    expect(cells[0]).toBe('-30'); // numbers stay numbers
    expect(cells.at(-1)).toBe("'=cmd|/c calc");
  });
});
