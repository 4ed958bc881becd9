/**
 * Everything the live preview shows for one candidate, computed with the shared engine: metrics, az/el cuts,
 * taper weights, and the design-level figures over the target sheet's scan range (so the preview's pass/fail
 * matches the trade table's). Pure, so tests and the main-thread fallback call it without a worker.
 * The worker answers in two steps (computeMain, then scanFigures) so the cuts appear before the slower scan.
 */
import { evaluateDesign, patternCut, taperWeights, type Metrics } from '@shared/engine/index.ts';
import { DesignSchema, type Design, type DesignInput } from '@shared/schemas/design.ts';
import { issueFields } from '@shared/schemas/format-issue.ts';
import { figuresFromPoints, type DesignFigures, type FigurePoint, type ScanRange } from '@shared/targets/index.ts';
import { scanAngles } from '@shared/targets/scan-angles.ts';

export interface PreviewRequest {
  design: DesignInput;
  /** The target sheet's scan range; absent = only the candidate's own steer. */
  scanAzDeg?: ScanRange | null;
  scanElDeg?: ScanRange | null;
  /** Cut sampling step, degrees. */
  stepDeg?: number;
}

export interface Cut {
  anglesDeg: number[];
  powerDb: number[];
}

export type PreviewResult =
  | {
      ok: true;
      design: Design;
      metrics: Metrics;
      cuts: { az: Cut; el: Cut };
      weights: { x: number[]; y: number[] };
      figures: DesignFigures;
      scanPoints: number;
      elapsedMs: number;
    }
  | { ok: false; fields: { field: string; message: string }[] };

// The scan grid is shared with the packet and the decisions, so their worst cases agree with the preview's.
export { scanAngles } from '@shared/targets/scan-angles.ts';

const toCut = (c: { anglesDeg: Float64Array; powerDb: Float64Array }): Cut => ({
  anglesDeg: Array.from(c.anglesDeg),
  powerDb: Array.from(c.powerDb),
});

/** Worst-case figures over the scan grid; reuses the candidate's own metrics for its own steer. */
export function scanFigures(design: Design, metrics: Metrics, request: Pick<PreviewRequest, 'scanAzDeg' | 'scanElDeg'>): { figures: DesignFigures; scanPoints: number } {
  const points: FigurePoint[] = scanAngles(design, request.scanAzDeg, request.scanElDeg).map(([a, e]) => {
    const d = { ...design, steerAzDeg: a, steerElDeg: e };
    return { design: d, metrics: a === design.steerAzDeg && e === design.steerElDeg ? metrics : evaluateDesign(d) };
  });
  return { figures: figuresFromPoints(points), scanPoints: points.length };
}

/** Metrics, cuts and weights of the candidate at its own steer; figures cover that one steer only. */
export function computeMain(request: PreviewRequest): PreviewResult {
  const started = performance.now();
  const parsed = DesignSchema.safeParse(request.design);
  if (!parsed.success) return { ok: false, fields: issueFields(parsed.error) };
  const design = parsed.data;
  const metrics = evaluateDesign(design);
  const stepDeg = request.stepDeg ?? 0.25;
  return {
    ok: true,
    design,
    metrics,
    cuts: { az: toCut(patternCut(design, 'az', { stepDeg })), el: toCut(patternCut(design, 'el', { stepDeg })) },
    weights: { x: Array.from(taperWeights(design.taperX, design.nx)), y: Array.from(taperWeights(design.taperY, design.ny)) },
    ...scanFigures(design, metrics, {}),
    elapsedMs: performance.now() - started,
  };
}

/** True when the sheet's scan range asks for more steers than the candidate's own. */
export function needsScan(result: PreviewResult, request: PreviewRequest): boolean {
  return result.ok && scanAngles(result.design, request.scanAzDeg, request.scanElDeg).length > 1;
}

/** Everything at once: the main result with figures over the sheet's scan range. */
export function computePreview(request: PreviewRequest): PreviewResult {
  const started = performance.now();
  const main = computeMain(request);
  if (!main.ok || !needsScan(main, request)) return main;
  return { ...main, ...scanFigures(main.design, main.metrics, request), elapsedMs: performance.now() - started };
}
