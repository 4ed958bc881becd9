/** The live point count of the builder: the shared countPoints over the form's grid, before anything runs. */
import { GridTooLarge, compileGrid } from '@shared/sweep/grid.ts';
import { SweepConstraintsSchema, SweepGridShapeSchema, type SweepGridInput } from '@shared/sweep/grid-schema.ts';
import { formatIssue } from '@shared/schemas/format-issue.ts';

export type PointCount = { points: number; designs: number; anglesPerDesign: number } | { error: string };

export function pointCount(grid: SweepGridInput | null, constraints: Record<string, number>): PointCount {
  if (!grid) return { error: 'fix the fields marked in red to see the count' };
  const g = SweepGridShapeSchema.safeParse(grid);
  if (!g.success) return { error: formatIssue(g.error) };
  const c = SweepConstraintsSchema.safeParse(constraints);
  if (!c.success) return { error: `constraints.${formatIssue(c.error)}` };
  try {
    const compiled = compileGrid(g.data, c.data);
    return { points: compiled.points, designs: compiled.designs, anglesPerDesign: compiled.anglesPerDesign };
  } catch (e) {
    if (e instanceof GridTooLarge) return { error: e.message };
    throw e;
  }
}
