/**
 * The work budget's unit: element·samples, one array element summed at one pattern direction. One pattern
 * evaluation (peak search, two cuts, directivity) samples about PATTERN_SAMPLES directions for each element;
 * small arrays cost at least ELEMENT_FLOOR elements' worth (fixed overhead per pattern). Measured on this
 * engine on the project's machine, quiet (`npm run bench -- work-cost`): 3–10 ns per element·sample (bench codes on
 * 64×64 about 3 ns, an 8×8 evaluation steered off both axes about 10 ns), two to three times that when the cores are
 * busy; so the default budget of 1e9 is about 3–10 s of one thread (an 11 × 11 beam codebook of a 64×64 panel just
 * fits), up to about 25 s under load.
 */
export const PATTERN_SAMPLES = 2000;
export const ELEMENT_FLOOR = 64;

/** Element·samples of `patterns` evaluations of an nx × ny array. */
export function patternWork(design: { nx: number; ny: number }, patterns = 1): number {
  return Math.max(design.nx * design.ny, ELEMENT_FLOOR) * PATTERN_SAMPLES * patterns;
}
