/** Device coverage: modules on a device's faces, their codebooks and the best-beam EIRP over a region. */
export { computeCoverage } from './compute-coverage.ts';
export type { CoverageResult, CoverageMap, ServedDirection } from './coverage-result.ts';
export { moduleFrame, type ModuleFrame, type Vec3 } from './module-frame.ts';
export { deviceDirection } from './device-direction.ts';
export { moduleAngles, deviceVectorOf } from './module-angles.ts';
export { regionGrid } from './region-grid.ts';
export { coveredSolidAngleSr } from './covered-solid-angle.ts';
export { gridCodebook, parseGridSpec } from './grid-codebook.ts';
export { fillRegionCodebook, type FilledCodebook } from './fill-region-codebook.ts';
export { autoStepDeg } from './auto-step-deg.ts';
export { COVERAGE_CAUTIONS, COVERAGE_MODEL_CAUTION } from './coverage-cautions.ts';
export { resolveCodebooks, type FillOutcome } from './resolve-codebooks.ts';
