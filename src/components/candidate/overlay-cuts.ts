/** Cuts of several saved candidates for the overlay chart; invalid designs are skipped with their name listed. */
import { patternCut } from '@shared/engine/index.ts';
import { DesignSchema, type DesignInput } from '@shared/schemas/design.ts';
import type { CutSeries } from '@/components/charts/cut-series';

/** Coarser than the live preview: overlays are for comparing shapes, and several run on the main thread. */
const OVERLAY_STEP_DEG = 0.5;

export function overlayCuts(candidates: { name: string; design: DesignInput }[]): { az: CutSeries[]; el: CutSeries[]; skipped: string[] } {
  const az: CutSeries[] = [];
  const el: CutSeries[] = [];
  const skipped: string[] = [];
  for (const c of candidates) {
    const parsed = DesignSchema.safeParse(c.design);
    if (!parsed.success) {
      skipped.push(c.name);
      continue;
    }
    const a = patternCut(parsed.data, 'az', { stepDeg: OVERLAY_STEP_DEG });
    const e = patternCut(parsed.data, 'el', { stepDeg: OVERLAY_STEP_DEG });
    az.push({ name: c.name, anglesDeg: Array.from(a.anglesDeg), powerDb: Array.from(a.powerDb) });
    el.push({ name: c.name, anglesDeg: Array.from(e.anglesDeg), powerDb: Array.from(e.powerDb) });
  }
  return { az, el, skipped };
}
