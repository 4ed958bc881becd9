import { describe, expect, it } from 'vitest';
import { channelCount } from '../../shared/schemas/design.ts';
import { planChunks } from '../../shared/sweep/chunks.ts';
import { SweepGridSchema } from '../../shared/sweep/grid-check.ts';
import { SweepGridShapeSchema, type SweepConstraints, type SweepGridInput } from '../../shared/sweep/grid-schema.ts';
import { GridTooLarge, compileGrid, countPoints } from '../../shared/sweep/grid.ts';
import { formatIssue } from '../../shared/schemas/format-issue.ts';

/** The documented order written out as plain nested loops (slowest first), for comparison. */
const ORDER = ['frequencyGHz', 'nx', 'ny', 'dxMm', 'dyMm', 'taperX', 'taperY', 'phaseBits', 'grouping', 'element', 'codes', 'channelPowerDbm', 'steerAzDeg', 'steerElDeg'];

function naive(grid: Record<string, unknown>, c: SweepConstraints = {}): Record<string, unknown>[] {
  const lists = ORDER.map((f) => {
    const v = grid[f];
    if (v === undefined) return [undefined];
    if (f === 'codes') return v as unknown[];
    return Array.isArray(v) ? v : [v];
  });
  let out: unknown[][] = [[]];
  for (const list of lists) out = out.flatMap((prefix) => list.map((v) => [...prefix, v]));
  return out
    .map((vals) => Object.fromEntries(ORDER.map((f, i) => [f, vals[i]]).filter(([, v]) => v !== undefined)))
    .filter((d) => {
      const nx = d.nx as number;
      const ny = (d.ny as number) ?? 1;
      const dx = d.dxMm as number;
      const dy = (d.dyMm as number) ?? dx;
      const ch = channelCount((d.grouping as 'element') ?? 'element', nx, ny);
      return !(
        (c.maxApertureXMm !== undefined && nx * dx > c.maxApertureXMm) ||
        (c.maxApertureYMm !== undefined && ny * dy > c.maxApertureYMm) ||
        (c.maxChannels !== undefined && ch > c.maxChannels)
      );
    });
}

const GRID: SweepGridInput = {
  frequencyGHz: [28, 39],
  nx: [4, 8, 16],
  ny: [1, 4],
  dxMm: [4, 5.35],
  taperX: [{ kind: 'uniform' }, { kind: 'taylor', sllDb: 25, nbar: 4 }],
  phaseBits: [null, 6],
  grouping: ['element', 'column'],
  steerAzDeg: [0, 15, 30],
};

describe('compileGrid(grid).pointAt(i)', () => {
  it('numbers the cartesian product with the last design field fastest and steering innermost', () => {
    const grid = SweepGridShapeSchema.parse(GRID);
    const g = compileGrid(grid);
    const expected = naive(grid);
    expect(g.points).toBe(expected.length);
    expect(g.points).toBe(2 * 3 * 2 * 2 * 2 * 2 * 2 * 3);
    for (let i = 0; i < g.points; i++) expect(g.pointAt(i).input).toEqual(expected[i]);
  });

  it('keeps the points of one design adjacent: designIndex and angleIndex follow from the index', () => {
    const grid = SweepGridShapeSchema.parse({ ...GRID, steerElDeg: [0, 10] , grouping: 'element' });
    const g = compileGrid(grid);
    expect(g.anglesPerDesign).toBe(6);
    for (const i of [0, 5, 6, 77, g.points - 1]) {
      const p = g.pointAt(i);
      expect(p.designIndex).toBe(Math.floor(i / 6));
      expect(p.angleIndex).toBe(i % 6);
      // angleIndex = azIndex * elCount + elIndex
      expect(p.input.steerAzDeg).toBe([0, 15, 30][Math.floor((i % 6) / 2)]);
      expect(p.input.steerElDeg).toBe([0, 10][i % 2]);
    }
  });

  it('drops whole designs that break geometry constraints, and the rest keep the same order', () => {
    const grid = SweepGridShapeSchema.parse(GRID);
    const constraints = { maxApertureXMm: 45, maxApertureYMm: 10, maxChannels: 16 };
    const g = compileGrid(grid, constraints);
    const expected = naive(grid, constraints);
    expect(expected.length).toBeGreaterThan(0);
    expect(expected.length).toBeLessThan(naive(grid).length);
    expect(g.points).toBe(expected.length);
    expect(g.points % g.anglesPerDesign).toBe(0);
    for (let i = 0; i < g.points; i++) expect(g.pointAt(i).input).toEqual(expected[i]);
  });

  it('counts without evaluating even when most of a large grid is dropped', () => {
    const nx = Array.from({ length: 64 }, (_, i) => i + 1);
    const grid = SweepGridShapeSchema.parse({ frequencyGHz: 28, nx, ny: nx, dxMm: 5, steerAzDeg: Array.from({ length: 61 }, (_, i) => i) });
    // nx·ny ≤ 16 channels: the pairs with nx·ny ≤ 16 (counted by hand below), times 61 angles.
    let pairs = 0;
    for (const a of nx) for (const b of nx) if (a * b <= 16) pairs++;
    expect(countPoints(grid, { maxChannels: 16 })).toBe(pairs * 61);
    expect(countPoints(grid)).toBe(64 * 64 * 61);
  });

  it('refuses geometry tables too large to keep', () => {
    const many = Array.from({ length: 2000 }, (_, i) => 1 + i / 100);
    const grid = SweepGridShapeSchema.parse({ frequencyGHz: 28, nx: [1, 2], dxMm: many, dyMm: many });
    expect(() => compileGrid(grid)).toThrow(GridTooLarge);
  });
});

describe('SweepGridSchema', () => {
  it('defaults dyMm to each point’s dxMm (a square lattice)', () => {
    const g = compileGrid(SweepGridSchema.parse({ frequencyGHz: 28, nx: 4, dxMm: [5, 6] }));
    expect(g.points).toBe(2);
  });

  const issue = (grid: unknown) => {
    const r = SweepGridSchema.safeParse(grid);
    return r.success ? null : formatIssue(r.error);
  };

  it('names a bad value with its list index', () => {
    expect(issue({ frequencyGHz: 28, nx: [4, 0], dxMm: 5 })).toBe('nx[1]: must be an integer from 1 to 64');
    expect(issue({ frequencyGHz: [28, 400], nx: 4, dxMm: 5 })).toBe('frequencyGHz[1]: must be a number from 0.1 to 300 (GHz)');
  });

  it('names the field of the first bad combination', () => {
    expect(issue({ frequencyGHz: 28, nx: [4, 2], dxMm: 5, taperX: [{ kind: 'uniform' }, { kind: 'hann' }] })).toMatch(/^taperX\[1\]: Hann/);
    expect(issue({ frequencyGHz: 28, nx: 4, dxMm: 5, grouping: ['element', 'column'], steerElDeg: [0, 10] })).toMatch(/^steerElDeg\[1\]: must be 0 with column/);
    expect(issue({ frequencyGHz: 28, nx: 4, dxMm: 5, phaseBits: 2, codes: [[0, 1, 2, 3], [0, 1, 2]] })).toMatch(/^codes\[1\]: must have 4 entries/);
    expect(issue({ frequencyGHz: 28, nx: 4, dxMm: 5, phaseBits: 2, codes: [[0, 1, 2, 4]] })).toMatch(/^codes\[0\]\[3\]: must be an integer from 0 to 3/);
  });

  it('rejects fields that are not design fields', () => {
    expect(issue({ frequencyGHz: 28, nx: 4, dxMm: 5, colour: 'red' })).toBe('colour: is not a known field');
  });
});

describe('planChunks', () => {
  it('cuts whole designs, covering every point once', () => {
    const g = compileGrid(SweepGridShapeSchema.parse(GRID));
    const chunks = planChunks(g, 10);
    expect(chunks[0]!.start).toBe(0);
    expect(chunks.at(-1)!.end).toBe(g.points);
    for (let i = 1; i < chunks.length; i++) expect(chunks[i]!.start).toBe(chunks[i - 1]!.end);
    for (const c of chunks) expect(c.start % g.anglesPerDesign).toBe(0);
  });
});
