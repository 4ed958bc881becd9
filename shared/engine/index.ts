/** The Lobewise array engine: pure pattern and metric functions shared by the browser, the server and workers. */
export { ENGINE_VERSION, SPEED_OF_LIGHT_M_S } from './constants.ts';
export { evaluateDesign } from './evaluate-design.ts';
export type { Metrics, EngineWarning } from './metrics.ts';
export { patternCut, patternPeakDeg } from './pattern-cut.ts';
export { uvMap } from './uv-map.ts';
export { channelCodes, progressivePhaseDeg } from './phase/channel-codes.ts';
export { taperWeights } from './taper/taper-weights.ts';
export { taperEfficiencyDb } from './taper/taper-efficiency.ts';
export { hann } from './taper/hann.ts';
export { hamming } from './taper/hamming.ts';
export { taylor } from './taper/taylor.ts';
export { chebyshev } from './taper/chebyshev.ts';
export { elementPower } from './element/element-power.ts';
export { tr38901PowerAt } from './element/tr38901.ts';
export { gratingLobeOnsetDeg } from './grating/grating-lobe-onset.ts';
export { wavelengthMm } from './units/wavelength-mm.ts';
export type { Design, DesignInput, Taper, Element } from '../schemas/design.ts';
