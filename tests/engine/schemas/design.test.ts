import { describe, expect, it } from 'vitest';
import { DesignOrListSchema, DesignSchema } from '../../../shared/schemas/design.ts';
import { formatIssue, issueFields } from '../../../shared/schemas/format-issue.ts';

const base = { frequencyGHz: 28, nx: 4, dxMm: 5 };
const firstIssue = (input: unknown) => {
  const r = DesignOrListSchema.safeParse(input);
  if (r.success) throw new Error('expected a failure');
  return formatIssue(r.error);
};

// The design table (README): defaults and rules.
describe('DesignSchema', () => {
  it('fills every default of the design table (dyMm = dxMm)', () => {
    expect(DesignSchema.parse(base)).toEqual({
      ...base, ny: 1, dyMm: 5, taperX: { kind: 'uniform' }, taperY: { kind: 'uniform' }, phaseBits: null, grouping: 'element',
      element: { kind: 'isotropic' }, steerAzDeg: 0, steerElDeg: 0, codes: null, channelPowerDbm: null,
    });
  });
  it('names the field and the rule', () => {
    expect(firstIssue({ ...base, nx: 65 })).toBe('nx: must be an integer from 1 to 64');
    expect(firstIssue({ ...base, nx: 2.5 })).toMatch(/^nx: /);
    expect(firstIssue({ ...base, frequencyGHz: 0.05 })).toMatch(/^frequencyGHz: must be a number from 0.1 to 300/);
    expect(firstIssue({ ...base, dxMm: 0 })).toMatch(/^dxMm: /);
    expect(firstIssue({ ...base, steerAzDeg: 91 })).toMatch(/^steerAzDeg: /);
    expect(firstIssue({ ...base, taperX: { kind: 'taylor', sllDb: 30 } })).toMatch(/^taperX\.nbar: /);
    expect(firstIssue({ ...base, element: { kind: 'dipole' } })).toMatch(/^element\.kind: /);
  });
  it('refuses unknown fields by name', () => {
    expect(firstIssue({ ...base, colour: 'red' })).toBe('colour: is not a known field');
  });
  it('column grouping cannot steer in el; row grouping cannot steer in az', () => {
    expect(firstIssue({ ...base, grouping: 'column', steerElDeg: 5 })).toMatch(/^steerElDeg: /);
    expect(firstIssue({ ...base, ny: 2, grouping: 'row', steerAzDeg: 5 })).toMatch(/^steerAzDeg: /);
  });
  it('Hann over exactly 2 elements is an error on that taper', () => {
    expect(firstIssue({ ...base, nx: 2, taperX: { kind: 'hann' } })).toMatch(/^taperX: /);
    expect(firstIssue({ ...base, ny: 2, taperY: { kind: 'hann' } })).toMatch(/^taperY: /);
  });
  it('codes need phaseBits, one per channel, each from 0 to 2^bits - 1', () => {
    expect(firstIssue({ ...base, codes: [0, 1, 2, 3] })).toMatch(/^codes: needs phaseBits/);
    expect(firstIssue({ ...base, phaseBits: 6, codes: [0, 1, 2] })).toMatch(/^codes: must have 4 entries/);
    expect(firstIssue({ ...base, phaseBits: 6, codes: [0, 1, 2, 64] })).toBe('codes[3]: must be an integer from 0 to 63 for 6-bit phase');
    expect(firstIssue({ ...base, phaseBits: 6, codes: [0, -1, 2, 3] })).toMatch(/^codes\[1\]: /);
    expect(firstIssue({ ...base, ny: 3, grouping: 'column', phaseBits: 3, codes: [0, 1, 2] })).toMatch(/^codes: must have 4 entries/);
  });
  it('a list reports the index of the bad design', () => {
    expect(firstIssue([base, base, { ...base, frequencyGHz: 400 }])).toMatch(/^\[2\]\.frequencyGHz: /);
    expect(DesignOrListSchema.parse([base, base])).toHaveLength(2);
  });
  it('issueFields lists every issue', () => {
    const r = DesignSchema.safeParse({ ...base, nx: 0, dxMm: -1 });
    expect(r.success).toBe(false);
    if (!r.success) expect(issueFields(r.error).map((i) => i.field).sort()).toEqual(['dxMm', 'nx']);
  });
});
