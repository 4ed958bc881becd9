/** Demo data for `npm start`: idempotent, so every start may call it. Features add their seeds here. */
import type { AppContext } from '../context.ts';

export async function seedDemo(_ctx: AppContext): Promise<void> {
  // Filled in by the accounts and workspace features.
}
