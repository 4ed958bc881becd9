/** Demo data for `npm start`: idempotent, so every start may call it. Features add their seeds here. */
import type { AppContext } from '../context.ts';
import { seedAccounts } from './accounts.ts';
import { seedDemoElementPattern } from './demo-element-pattern.ts';
import { seedDemoRangeData } from './demo-range-data.ts';
import { seedDemoStudy } from './demo-study.ts';

export async function seedDemo(ctx: AppContext): Promise<void> {
  await seedAccounts(ctx);
  const demo = await seedDemoStudy(ctx);
  // Only with a study just made, so a restart never adds the cuts twice.
  if (demo) await seedDemoRangeData(ctx, demo.studyId);
  if (demo) await seedDemoElementPattern(ctx, demo.studyId);
}
