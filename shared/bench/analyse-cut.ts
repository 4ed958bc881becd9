import { quadraticFit, smoothDb } from './smooth-db.ts';

/** Peak, -3 dB width and side-lobe level of a sampled cut (measured or model), in the cut's own angles. */
export interface CutAnalysis {
  peakDeg: number;
  /** Peak power in the cut's unit (dBm or dB). */
  peakDb: number;
  hpbwDeg: number;
  /** The -3 dB points (interpolated); an end of the cut when the beam never falls that far there. */
  halfPowerDeg: [number, number];
  clipped: boolean;
  /** Highest level outside the main lobe relative to the peak (dB, negative); null when the main lobe fills the cut. */
  sllDb: number | null;
}

export interface AnalyseOptions {
  /** Peak ties (within tieDb) go to the sample nearest this angle. */
  nearDeg?: number;
  /**
   * A dip ends the main lobe only if the pattern then climbs by at least this much (dB): measurement
   * noise makes small dips on the beam's skirt that are not nulls. 0 for a clean model cut.
   */
  nullDepthDb?: number;
  /** Smooth a noisy (measured) cut first, over ±1/8 of a first width estimate (see smoothDb). */
  smooth?: boolean;
}

const TIE_DB = 1e-6;
function crossing(a0: number, p0: number, a1: number, p1: number, level: number): number {
  return p1 === p0 ? a0 : a0 + ((level - p0) / (p1 - p0)) * (a1 - a0);
}

/**
 * Peak of a noisy cut: vertex of a quadratic fitted to the top of the main lobe (±halfWindow, a third
 * of the width), re-centred once; uses the whole top of the beam, not three noisy samples, and gives
 * the peak level without the upward bias of the largest noisy sample.
 */
function fittedPeak(angle: readonly number[], db: readonly number[], startDeg: number, halfWindowDeg: number): { deg: number; db: number } | null {
  let centre = startDeg;
  let level = NaN;
  for (let pass = 0; pass < 3; pass++) {
    const f = quadraticFit(angle, db, centre, halfWindowDeg);
    if (!(f.c2 < 0) || f.count < 5) return null;
    const shift = -f.c1 / (2 * f.c2);
    if (Math.abs(shift) > halfWindowDeg) return null;
    level = f.c0 - (f.c1 * f.c1) / (4 * f.c2);
    centre += shift;
  }
  return { deg: centre, db: level };
}

/** Vertex of the parabola through samples i-1, i, i+1 (the sample itself at a cut end). */
function vertex(angle: readonly number[], db: readonly number[], i: number): number {
  if (i === 0 || i === db.length - 1) return angle[i]!;
  const [x0, x1, x2] = [angle[i - 1]!, angle[i]!, angle[i + 1]!];
  const [y0, y1, y2] = [db[i - 1]!, db[i]!, db[i + 1]!];
  const den = (x0 - x1) * (x0 - x2) * (x1 - x2);
  const a = (x2 * (y1 - y0) + x1 * (y0 - y2) + x0 * (y2 - y1)) / den;
  const b = (x2 * x2 * (y0 - y1) + x1 * x1 * (y2 - y0) + x0 * x0 * (y1 - y2)) / den;
  if (!(a < 0)) return x1;
  return Math.max(x0, Math.min(x2, -b / (2 * a)));
}

/** Index where the main lobe ends walking from the peak (dir ±1): the first dip followed by a climb of nullDepthDb. */
function lobeEnd(db: readonly number[], peak: number, dir: 1 | -1, nullDepthDb: number): number {
  let low = peak;
  for (let i = peak + dir; i >= 0 && i < db.length; i += dir) {
    if (db[i]! < db[low]!) low = i;
    else if (db[i]! > db[low]! + nullDepthDb && (nullDepthDb > 0 || db[i]! > db[i - dir]!)) return low;
  }
  return dir > 0 ? db.length - 1 : 0;
}

/**
 * Analysis of one cut sampled at increasing angles: the peak (parabola through the top three samples,
 * or with `smooth` a quadratic fit to the top of the beam), the half-power width interpolated linearly
 * in dB between the bracketing samples, and the side-lobe level outside the main lobe (which runs
 * between the first nulls either side of the peak).
 */
export function analyseCut(angleDeg: readonly number[], powerDb: readonly number[], options: AnalyseOptions = {}): CutAnalysis {
  const n = angleDeg.length;
  if (n < 3 || powerDb.length !== n) throw new RangeError('invalid cut');
  if (!options.smooth) return analyseSamples(angleDeg, powerDb, options, null);
  const rough = analyseSamples(angleDeg, powerDb, options, null);
  const spacing = (angleDeg[n - 1]! - angleDeg[0]!) / (n - 1);
  const smoothed = smoothDb(angleDeg, powerDb, Math.max(rough.hpbwDeg / 8, 2 * spacing));
  const first = analyseSamples(angleDeg, smoothed, options, null);
  const peak = fittedPeak(angleDeg, powerDb, first.peakDeg, first.hpbwDeg / 3);
  return peak ? analyseSamples(angleDeg, smoothed, options, peak) : first;
}

function analyseSamples(
  angleDeg: readonly number[],
  powerDb: readonly number[],
  options: AnalyseOptions,
  fitted: { deg: number; db: number } | null,
): CutAnalysis {
  const n = angleDeg.length;
  let best = 0;
  for (let i = 1; i < n; i++) {
    const d = powerDb[i]! - powerDb[best]!;
    const nearer = options.nearDeg !== undefined && Math.abs(angleDeg[i]! - options.nearDeg) < Math.abs(angleDeg[best]! - options.nearDeg);
    if (d > TIE_DB || (Math.abs(d) <= TIE_DB && nearer)) best = i;
  }
  const peakDb = fitted?.db ?? powerDb[best]!;
  const half = peakDb - 10 * Math.log10(2);
  const edge = (dir: 1 | -1): { deg: number; clipped: boolean } => {
    for (let i = best + dir; i >= 0 && i < n; i += dir) {
      if (powerDb[i]! < half) return { deg: crossing(angleDeg[i - dir]!, powerDb[i - dir]!, angleDeg[i]!, powerDb[i]!, half), clipped: false };
    }
    return { deg: angleDeg[dir > 0 ? n - 1 : 0]!, clipped: true };
  };
  const lo = edge(-1);
  const hi = edge(1);
  const depth = options.nullDepthDb ?? 0;
  const left = lobeEnd(powerDb, best, -1, depth);
  const right = lobeEnd(powerDb, best, 1, depth);
  let side = -Infinity;
  for (let i = 0; i < n; i++) if (i < left || i > right) side = Math.max(side, powerDb[i]!);
  return {
    peakDeg: fitted?.deg ?? vertex(angleDeg, powerDb, best),
    peakDb,
    hpbwDeg: hi.deg - lo.deg,
    halfPowerDeg: [lo.deg, hi.deg],
    clipped: lo.clipped || hi.clipped,
    sllDb: Number.isFinite(side) ? Math.min(0, side - peakDb) : null,
  };
}
