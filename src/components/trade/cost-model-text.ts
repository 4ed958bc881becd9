/** The cost model behind a sweep's cost columns in words, for export header blocks. */
import type { SweepCostBasis } from '@shared/cost/cost-model.ts';

export function costModelText(b: SweepCostBasis | null): string | null {
  if (!b || b.version === null) return b?.currentVersion == null ? 'none (cost columns empty)' : null;
  return `version ${b.version}${b.current ? ' (current)' : `, the study's model is now version ${b.currentVersion}`}; Module cost in ${b.currency ?? 'the model currency'}; prices are the study's own inputs`;
}
