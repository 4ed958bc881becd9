/**
 * Seeded random numbers for reproducible Monte Carlo runs. mulberry32 (Tommy Ettinger, public domain):
 * a 32-bit state generator, small and fast, plenty for error draws; no package needed in browser or worker.
 */
export type Random = () => number;

export function mulberry32(seed: number): Random {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A 32-bit seed for trial i of a run, so a run split over workers draws the same numbers as one piece. */
export function trialSeed(seed: number, trial: number): number {
  // splitmix32-style mix of (seed, trial).
  let z = (seed ^ Math.imul(trial + 1, 0x9e3779b9)) >>> 0;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0;
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0;
  return (z ^ (z >>> 16)) >>> 0;
}

/** Standard normal draws by the Box-Muller transform (Box & Muller, Ann. Math. Stat. 29, 1958). */
export function gaussian(random: Random): () => number {
  let spare: number | null = null;
  return () => {
    if (spare !== null) {
      const s = spare;
      spare = null;
      return s;
    }
    let u = 0;
    while (u === 0) u = random();
    const r = Math.sqrt(-2 * Math.log(u));
    const t = 2 * Math.PI * random();
    spare = r * Math.sin(t);
    return r * Math.cos(t);
  };
}
