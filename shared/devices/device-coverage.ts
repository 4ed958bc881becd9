/**
 * Coverage of a device: each module's codebook from its rule, then the engine's computeCoverage over the region the
 * sheet asks for, then the sheet's check. Pure (the devices page runs it in a worker, sweeps on the worker pool);
 * `onProgress` reports steps done of steps in all (one per module's codebook, one for the coverage).
 */
import { computeCoverage } from '../coverage/compute-coverage.ts';
import type { CoverageResult } from '../coverage/coverage-result.ts';
import { CoverageRequestSchema, type Beam } from '../schemas/coverage.ts';
import type { Design } from '../schemas/design.ts';
import type { DeviceLayout } from '../schemas/device.ts';
import { checkAgainstSheet, type SheetCheck } from '../targets/check.ts';
import type { TargetSheet } from '../targets/sheet.ts';
import { deviceFigures } from './device-figures.ts';
import { deviceRegion } from './device-region.ts';
import { moduleBeams, type ModuleBeams } from './module-beams.ts';

/** Percentiles every device result reports (the CDF chart marks them). */
export const DEVICE_PERCENTILES = [10, 50, 90];

export interface DeviceCoverageInput {
  layout: DeviceLayout;
  /** The design of each module's candidate, by candidate id. */
  designs: Record<string, Design>;
  sheet: TargetSheet | null;
  stepDeg?: number;
}

export interface DeviceCoverageResult {
  coverage: CoverageResult;
  codebooks: (ModuleBeams & { face: string; candidateId: string })[];
  check: SheetCheck | null;
  beamsTotal: number;
}

export class DeviceCoverageError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`);
  }
}

export function deviceCoverage(input: DeviceCoverageInput, onProgress: (done: number, total: number) => void = () => {}): DeviceCoverageResult {
  const { layout, designs, sheet } = input;
  const total = layout.modules.length + 1;
  const codebooks = layout.modules.map((m, i) => {
    const design = designs[m.candidateId];
    if (!design) throw new DeviceCoverageError(`layout.modules[${i}].candidateId`, 'names no candidate of this study');
    const beams = moduleBeams(design, m.codebook);
    onProgress(i + 1, total);
    return { ...beams, face: m.face, candidateId: m.candidateId };
  });
  const parsed = CoverageRequestSchema.safeParse({
    modules: layout.modules.map((m, i) => ({ design: { ...designs[m.candidateId]!, codes: null }, orientation: m.face, beams: codebooks[i]!.beams as Beam[] })),
    region: deviceRegion(sheet),
    percentiles: DEVICE_PERCENTILES,
    ...(input.stepDeg ? { stepDeg: input.stepDeg } : {}),
  });
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    // modules[i] of the request is layout.modules[i] of the device.
    const path = issue.path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '');
    throw new DeviceCoverageError(path.startsWith('modules') ? `layout.${path}` : path, issue.message);
  }
  const coverage = computeCoverage(parsed.data);
  onProgress(total, total);
  return {
    coverage,
    codebooks,
    check: sheet ? checkAgainstSheet(deviceFigures(coverage), sheet) : null,
    beamsTotal: codebooks.reduce((s, c) => s + c.beams.length, 0),
  };
}
