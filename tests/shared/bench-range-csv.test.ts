import { describe, expect, it } from 'vitest';
import { decodeText } from '../../shared/bench/decode-text.ts';
import { DelimitedParseError } from '../../shared/bench/delimited-parse-error.ts';
import { parseCalibrationCsv } from '../../shared/bench/parse-calibration-csv.ts';
import { MAX_RANGE_POINTS, parseRangeCsv } from '../../shared/bench/parse-range-csv.ts';

const rows = (sep: string, dec = '.') =>
  [-20, -10, 0, 10, 20].map((a, i) => `${a}${sep}${(-i * 1.5 - 3.25).toFixed(2).replace('.', dec)}`).join('\n');

describe('parseRangeCsv(text) accepts the common variants', () => {
  it('comma-separated without a header', () => {
    const r = parseRangeCsv(rows(','));
    expect(r.angleDeg).toEqual([-20, -10, 0, 10, 20]);
    expect(r.cuts[0]!.powerDb).toEqual([-3.25, -4.75, -6.25, -7.75, -9.25]);
    expect(r.hasHeader).toBe(false);
    expect(r.unit).toBe('dB');
  });

  it('semicolons with decimal commas, a header naming dBm, CRLF line ends, a BOM and comment lines', () => {
    const text = `\uFEFF# turntable run 14\r\nangle_deg;power_dBm\r\n${rows(';', ',').replace(/\n/g, '\r\n')}\r\n\r\n`;
    const r = parseRangeCsv(text);
    expect(r.decimalComma).toBe(true);
    expect(r.delimiter).toBe(';');
    expect(r.unit).toBe('dBm');
    expect(r.cuts[0]!.name).toBe('power_dBm');
    expect(r.cuts[0]!.powerDb[1]).toBeCloseTo(-4.75, 12);
  });

  it('a second cut in a third column, quoted cells, and decreasing angles (returned increasing)', () => {
    const text = 'angle,"az cut","el cut"\n20,-9,-1\n10,-5,-2\n0,0,-3\n-10,-5,-4\n-20,-9,-5\n';
    const r = parseRangeCsv(text);
    expect(r.angleDeg).toEqual([-20, -10, 0, 10, 20]);
    expect(r.cuts.map((c) => c.name)).toEqual(['az cut', 'el cut']);
    expect(r.cuts[1]!.powerDb).toEqual([-5, -4, -3, -2, -1]);
  });

  it('exponent notation', () => {
    expect(parseRangeCsv('0,1e-1\n1,2E1\n2,3\n3,4\n4,5').cuts[0]!.powerDb[1]).toBe(20);
  });
});

describe('parseRangeCsv(text) refuses malformed files with the line and the reason', () => {
  const cases: [string, string, number, RegExp][] = [
    ['an empty file', '', 1, /empty/],
    ['only blank and comment lines', '\n# nothing\n\n', 1, /empty/],
    ['a header only', 'angle,power\n', 1, /header but no data/],
    ['tab-separated values', '0\t-3\n1\t-4\n', 1, /no comma or semicolon/],
    ['a single column', '0\n1\n2\n', 1, /no comma or semicolon/],
    ['four columns', '0,1,2,3\n1,1,2,3\n', 1, /2 or 3 columns/],
    ['a short row', '0,-1\n1,-2\n2\n3,-4\n4,-5\n', 3, /no comma or semicolon|expected 2 values/],
    ['a long row', '0,-1\n1,-2\n2,-3,-9\n3,-4\n4,-5\n', 3, /expected 2 values/],
    ['a word in the data', '0,-1\n1,-2\n2,abc\n3,-4\n4,-5\n', 3, /column 2: "abc" is not a number/],
    ['a second header in the middle', 'a,b\n0,-1\n1,-2\nangle,power\n3,-4\n', 4, /not a number/],
    ['NaN', '0,-1\n1,NaN\n2,-3\n3,-4\n4,-5\n', 2, /not a number/],
    ['Infinity', '0,-1\n1,-2\n2,Infinity\n3,-4\n4,-5\n', 3, /not a number/],
    ['an empty value', '0,-1\n1,\n2,-3\n3,-4\n4,-5\n', 2, /empty value/],
    ['semicolons mixed into a comma file', '0,-1\n1;-2\n2,-3\n3,-4\n4,-5\n', 2, /mixes semicolons/],
    ['decimal commas after decimal points', '0;-1.5\n1;-2.5\n2;-3,5\n3;-4\n4;-5\n', 3, /decimal comma but earlier lines use a decimal point/],
    ['a thousands separator', '0;-1\n1;1.000,5\n2;-3\n3;-4\n4;-5\n', 2, /mixes a decimal point and a comma/],
    ['a repeated angle', '0,-1\n1,-2\n1,-3\n3,-4\n4,-5\n', 3, /repeats/],
    ['angles going back and forth', '0,-1\n1,-2\n3,-3\n2,-4\n4,-5\n', 4, /keep increasing/],
    ['too few points', '0,-1\n1,-2\n2,-3\n', 3, /at least 5/],
    ['an angle beyond 360°', '0,-1\n1,-2\n400,-3\n401,-4\n402,-5\n', 3, /outside -360..360/],
    ['angles spanning more than a turn', '-300,-1\n-100,-2\n0,-3\n100,-4\n300,-5\n', 5, /more than 360/],
    ['a power far beyond any receiver', '0,-1\n1,-2\n2,-3000\n3,-4\n4,-5\n', 3, /outside ±300 dB/],
  ];
  it.each(cases)('%s', (_name, text, line, reason) => {
    let caught: unknown;
    try {
      parseRangeCsv(text);
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(DelimitedParseError);
    const e = caught as DelimitedParseError;
    expect(e.line).toBe(line);
    expect(e.reason).toMatch(reason);
    expect(e.message).toBe(`line ${line}: ${e.reason}`);
  });

  it('more data lines than the limit', () => {
    const text = Array.from({ length: MAX_RANGE_POINTS + 1 }, (_, i) => `${(i * 0.01).toFixed(2)},-1`).join('\n');
    expect(() => parseRangeCsv(text)).toThrow(`line ${MAX_RANGE_POINTS + 1}: more than ${MAX_RANGE_POINTS} data lines`);
  });
});

describe('decodeText(bytes)', () => {
  it('refuses a binary file (NUL bytes) with the line of the first one', () => {
    const bytes = new Uint8Array([0x30, 0x2c, 0x31, 0x0a, 0x31, 0x00, 0x32]);
    expect(() => decodeText(bytes)).toThrow('line 2: holds a NUL byte');
  });
  it('refuses text that is not UTF-8 (a Latin-1 degree sign) with its line', () => {
    const bytes = new Uint8Array([...new TextEncoder().encode('angle,power\n0,-1\n'), 0xb0, 0x0a]);
    expect(() => decodeText(bytes)).toThrow('line 3: is not UTF-8 text');
  });
  it('decodes UTF-8 text', () => {
    expect(decodeText(new TextEncoder().encode('angle (°),dB\n'))).toBe('angle (°),dB\n');
  });
});

describe('parseCalibrationCsv(text)', () => {
  it('reads channel, gainDb, phaseDeg with or without a header, semicolons and decimal commas', () => {
    expect(parseCalibrationCsv('channel,gainDb,phaseDeg\n1,0.5,-12\n2,-0.25,7.5\n')).toEqual([
      { channel: 1, gainDb: 0.5, phaseDeg: -12 },
      { channel: 2, gainDb: -0.25, phaseDeg: 7.5 },
    ]);
    expect(parseCalibrationCsv('1;0,5;-12\n2;-0,25;7,5')[1]).toEqual({ channel: 2, gainDb: -0.25, phaseDeg: 7.5 });
  });
  it.each([
    ['a fractional channel', '1.5,0,0\n', 1, /channel/],
    ['channel 0', '0,0,0\n', 1, /channel/],
    ['a phase beyond ±360°', '1,0,0\n2,0,400\n', 2, /phaseDeg/],
    ['a duplicate channel', '1,0,0\n1,0,1\n', 2, /listed twice/],
    ['two columns', '1,0\n', 1, /expected 3 values/],
  ])('refuses %s with its line', (_name, text, line, reason) => {
    try {
      parseCalibrationCsv(text);
      expect.unreachable();
    } catch (err) {
      expect((err as DelimitedParseError).line).toBe(line);
      expect((err as DelimitedParseError).reason).toMatch(reason);
    }
  });
});
