/** Demo data for `npm start`: idempotent, so every start may call it. Features add their seeds here. */
import type { AppContext } from '../context.ts';
import { seedAccounts } from './accounts.ts';
import { seedDemoStudy } from './demo-study.ts';

export async function seedDemo(ctx: AppContext): Promise<void> {
  await seedAccounts(ctx);
  await seedDemoStudy(ctx);
  // Filled in by the accounts and workspace features.
}
