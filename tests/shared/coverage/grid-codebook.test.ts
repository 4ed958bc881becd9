import { describe, expect, it } from 'vitest';
import { gridCodebook, parseGridSpec } from '../../../shared/coverage/index.ts';

describe('gridCodebook(spec)', () => {
  it('expands "az START:STOP:STEP × el START:STOP:STEP" with az fastest and STOP included', () => {
    expect(gridCodebook('az -30:30:30 × el -10:10:20')).toEqual([
      { azDeg: -30, elDeg: -10 }, { azDeg: 0, elDeg: -10 }, { azDeg: 30, elDeg: -10 },
      { azDeg: -30, elDeg: 10 }, { azDeg: 0, elDeg: 10 }, { azDeg: 30, elDeg: 10 },
    ]);
  });

  it('accepts x for ×, one angle for an axis, and decimal steps that land on round values', () => {
    expect(gridCodebook('az 0 x el 0')).toEqual([{ azDeg: 0, elDeg: 0 }]);
    expect(gridCodebook('az 0.1:0.3:0.1 × el 0').map((b) => b.azDeg)).toEqual([0.1, 0.2, 0.3]);
    expect(gridCodebook('az -45:40:15 × el 0').map((b) => b.azDeg)).toEqual([-45, -30, -15, 0, 15, 30]);
  });

  it('says what is wrong with a bad spec', () => {
    expect(parseGridSpec('el 0 × az 0')).toEqual({ problem: expect.stringMatching(/^must be "az START:STOP:STEP × el/) });
    expect(parseGridSpec('az -100:0:10 × el 0')).toEqual({ problem: 'az angles must be from -90 to 90 degrees' });
    expect(parseGridSpec('az 0:10:0 × el 0')).toEqual({ problem: 'az step must be greater than 0' });
    expect(parseGridSpec('az 10:0:5 × el 0')).toEqual({ problem: 'az STOP must not be below START' });
    expect(parseGridSpec('az -90:90:1 × el -5:5:1')).toEqual({ problem: expect.stringMatching(/beams; at most 128|angles; at most 128/) });
    expect(() => gridCodebook('nonsense')).toThrow(RangeError);
  });
});
