/**
 * Demo element pattern: the invented patch-like pattern of shared/patterns/demo-patch-pattern.ts, uploaded to the demo
 * study as an engineer would (a 2° CSV), so a candidate can pick element "Uploaded pattern" at first sign-in.
 */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Study } from '../entities/study.ts';
import { User } from '../entities/user.ts';
import { createElementPattern } from '../services/element-pattern-service.ts';
import { demoPatchPattern, patternCsv } from '../../shared/patterns/demo-patch-pattern.ts';

export const DEMO_PATTERN_NAME = 'Patch element, invented demo pattern (2° grid)';

/** Call only right after the demo study is created (the seed is idempotent by that). */
export async function seedDemoElementPattern(ctx: AppContext, studyId: string): Promise<void> {
  const study = await ctx.db.getRepository(Study).findOneBy({ id: studyId });
  const user = study ? await ctx.db.getRepository(User).findOneBy({ id: study.ownerId }) : null;
  if (!user) return;
  const actor: AuthUser = { id: user.id, email: user.email, name: user.name, role: user.role, teamId: user.teamId };
  const csv = Buffer.from(patternCsv(demoPatchPattern(2)));
  await createElementPattern(ctx, actor, studyId, DEMO_PATTERN_NAME, { originalname: 'patch-element-demo.csv', buffer: csv });
}
