import { describe, expect, it } from 'vitest';
import { deviceCodesCsv } from '../../shared/devices/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';

// 4 elements at half a wavelength (5.35 mm at 28 GHz ≈ λ/2), 3-bit phase (45° per code).
const design = DesignSchema.parse({ frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, phaseBits: 3, channelPowerDbm: 10 });
const wide = DesignSchema.parse({ frequencyGHz: 28, nx: 8, ny: 1, dxMm: 5.35, phaseBits: 3, channelPowerDbm: 10 });

describe('deviceCodesCsv(name, modules)', () => {
  it('writes one row per module and beam, with one code per channel', () => {
    const csv = deviceCodesCsv('Phone', [
      { label: 'M1', face: 'right', candidate: 'Edge 1×4', design, beams: [{ azDeg: 0, elDeg: 0 }, { azDeg: 30, elDeg: 0 }] },
      { label: 'M2', face: 'left', candidate: 'Edge 1×8', design: wide, beams: [{ azDeg: 0, elDeg: 0 }] },
    ]);
    const lines = csv.trim().split('\r\n').filter((l) => !l.startsWith('#'));
    expect(lines[0]).toBe('module,face,candidate,beam,azDeg,elDeg,ch1,ch2,ch3,ch4,ch5,ch6,ch7,ch8');
    expect(lines).toHaveLength(4);
    // Broadside: every channel at code 0; the 4-channel module leaves ch5..ch8 empty.
    expect(lines[1]).toBe('M1,right,Edge 1×4,1,0,0,0,0,0,0,,,,');
    // 30° at d = 5.35 mm, λ = 299.792458/28 mm: Δφ = 360·d·sin30°/λ ≈ 89.9° per element → codes round(m·89.9/45) mod 8
    // = 0, 2, 4, 6 (progressive phase from the engine contract; hand computation).
    expect(lines[2]).toBe('M1,right,Edge 1×4,2,30,0,0,2,4,6,,,,');
    expect(lines[3]!.split(',').slice(6)).toEqual(['0', '0', '0', '0', '0', '0', '0', '0']);
  });

  it('neutralises text that a spreadsheet would run as a formula', () => {
    const csv = deviceCodesCsv('=cmd', [{ label: 'M1', face: 'front', candidate: '=HYPERLINK("x")', design, beams: [{ azDeg: 0, elDeg: 0 }] }]);
    expect(csv).not.toMatch(/,=HYPERLINK/);
    expect(csv).toContain("'=HYPERLINK");
  });
});
