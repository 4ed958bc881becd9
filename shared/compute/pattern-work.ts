/**
 * The work budget's unit: element·samples, one array element summed at one pattern direction. One pattern
 * evaluation (peak search, two cuts, directivity) samples about PATTERN_SAMPLES directions for each element;
 * small arrays cost at least ELEMENT_FLOOR elements' worth (fixed overhead per pattern). Measured on this
 * engine at roughly 20–40 ns per element·sample on one core, so 5e8 is about 10–20 s of one thread.
 */
export const PATTERN_SAMPLES = 2000;
export const ELEMENT_FLOOR = 64;

/** Element·samples of `patterns` evaluations of an nx × ny array. */
export function patternWork(design: { nx: number; ny: number }, patterns = 1): number {
  return Math.max(design.nx * design.ny, ELEMENT_FLOOR) * PATTERN_SAMPLES * patterns;
}
