/**
 * A slow, independent reference for the engine's metrics: direct sums over element positions,
 * dense angular sampling, zooming grid searches and midpoint integration over the whole sphere.
 * No closed forms, no shared search code; only the validated taper weights are borrowed.
 */
import type { Design } from '../../../shared/schemas/design.ts';
import { taperWeights } from '../../../shared/engine/taper/taper-weights.ts';
import type { ElementPattern } from '../../../shared/schemas/element-pattern.ts';

const C = 299792458;
const D2R = Math.PI / 180;

export interface RefArray {
  xs: number[]; // element positions, m, x fastest
  ys: number[];
  re: number[];
  im: number[];
  k: number;
  nx: number;
  ny: number;
  element: (azDeg: number, elDeg: number) => number;
  steer: { az: number; el: number }; // degrees, the tie-break direction
  /** Per-axis weights when the phases are continuous (then AF = AFx·AFy, still summed directly). */
  axes?: { x: number[]; xr: number[]; xi: number[]; y: number[]; yr: number[]; yi: number[] };
}

/**
 * A table element's linear power at (az, el), written out again: bilinear in az and el between the four grid values
 * around the direction (linear power, not dB), the azimuth axis wrapping when it spans the circle, elevations clamped
 * to the grid, nothing outside the azimuths it covers.
 */
function refTable(p: ElementPattern): (azDeg: number, elDeg: number) => number {
  const nAz = p.azDeg.length;
  const nEl = p.elDeg.length;
  const stepAz = (p.azDeg[nAz - 1]! - p.azDeg[0]!) / (nAz - 1);
  const stepEl = (p.elDeg[nEl - 1]! - p.elDeg[0]!) / (nEl - 1);
  const wraps = Math.abs(nAz * stepAz - 360) < 1e-6;
  const lin = p.gainDbi.map((g) => 10 ** (g / 10));
  const at = (i: number, j: number) => lin[j * nAz + i]!;
  return (az, el) => {
    let fa = (az - p.azDeg[0]!) / stepAz;
    if (wraps) fa = ((fa % nAz) + nAz) % nAz;
    else if (fa < -1e-9 || fa > nAz - 1 + 1e-9) return 0;
    const fe = Math.min(Math.max((el - p.elDeg[0]!) / stepEl, 0), nEl - 1);
    const i0 = wraps ? Math.floor(fa) % nAz : Math.min(Math.max(Math.floor(fa), 0), nAz - 2);
    const i1 = wraps ? (i0 + 1) % nAz : i0 + 1;
    const j0 = Math.min(Math.floor(fe), nEl - 2);
    const w = Math.min(Math.max(fa - i0, 0), 1);
    const v = fe - j0;
    return (1 - w) * (1 - v) * at(i0, j0) + w * (1 - v) * at(i1, j0) + (1 - w) * v * at(i0, j0 + 1) + w * v * at(i1, j0 + 1);
  };
}

export function refElement(design: Design): (azDeg: number, elDeg: number) => number {
  const e = design.element;
  if (e.kind === 'isotropic') return () => 1;
  if (e.kind === 'table') {
    if (!e.pattern) throw new Error('the reference needs the table element with its values');
    return refTable(e.pattern);
  }
  if (e.kind === 'cosine') {
    return (az, el) => {
      const c = Math.cos(az * D2R) * Math.cos(el * D2R);
      return c > 0 ? Math.pow(c, e.q) : 0;
    };
  }
  return (az, el) => {
    const av = -Math.min(12 * (el / 65) ** 2, 30);
    const ah = -Math.min(12 * (az / 65) ** 2, 30);
    return Math.pow(10, (-Math.min(-(av + ah), 30) + 8) / 10);
  };
}

/** Codes per element from the phase-code rules, written out again independently. */
function refPhasesDeg(design: Design): number[] {
  const lam = C / (design.frequencyGHz * 1e9);
  const u0 = Math.sin(design.steerAzDeg * D2R) * Math.cos(design.steerElDeg * D2R);
  const v0 = Math.sin(design.steerElDeg * D2R);
  const ddx = design.grouping === 'row' ? 0 : (360 * design.dxMm * 1e-3 * u0) / lam;
  const ddy = design.grouping === 'column' ? 0 : (360 * design.dyMm * 1e-3 * v0) / lam;
  const out: number[] = [];
  for (let n = 0; n < design.ny; n++) {
    for (let m = 0; m < design.nx; m++) {
      if (design.phaseBits === null) {
        out.push(-(m * ddx + n * ddy));
        continue;
      }
      const levels = 2 ** design.phaseBits;
      const step = 360 / levels;
      const ch = design.grouping === 'element' ? n * design.nx + m : design.grouping === 'column' ? m : n;
      let code: number;
      if (design.codes) code = design.codes[ch]!;
      else {
        const mm = design.grouping === 'row' ? 0 : m;
        const nn = design.grouping === 'column' ? 0 : n;
        code = (((Math.floor((mm * ddx + nn * ddy) / step + 0.5)) % levels) + levels) % levels;
      }
      out.push(-code * step);
    }
  }
  return out;
}

/** Amplitude after a channel attenuator, written out again: code = round(-20·log10(a)/step) within 0..2^bits - 1. */
function refAttenuate(a: number, design: Design): number {
  if (design.attenuatorStepDb === undefined || design.attenuatorBits === undefined) return a;
  const top = Math.pow(2, design.attenuatorBits) - 1;
  const code = a <= 0 ? top : Math.min(top, Math.max(0, Math.round((-20 * Math.log10(a)) / design.attenuatorStepDb)));
  return Math.pow(10, (-code * design.attenuatorStepDb) / 20);
}

/** Channels as lists of the elements they feed, with the amplitude each element gets after quantisation. */
export function refChannels(design: Design): { amplitude: number; elements: { m: number; n: number; a: number }[] }[] {
  const tx = taperWeights(design.taperX, design.nx);
  const ty = taperWeights(design.taperY, design.ny);
  const out: { amplitude: number; elements: { m: number; n: number; a: number }[] }[] = [];
  if (design.grouping === 'column') {
    for (let m = 0; m < design.nx; m++) {
      const q = refAttenuate(tx[m]!, design);
      out.push({ amplitude: q, elements: Array.from({ length: design.ny }, (_, n) => ({ m, n, a: q * ty[n]! })) });
    }
  } else if (design.grouping === 'row') {
    for (let n = 0; n < design.ny; n++) {
      const q = refAttenuate(ty[n]!, design);
      out.push({ amplitude: q, elements: Array.from({ length: design.nx }, (_, m) => ({ m, n, a: tx[m]! * q })) });
    }
  } else {
    for (let n = 0; n < design.ny; n++) for (let m = 0; m < design.nx; m++) {
      const q = refAttenuate(tx[m]! * ty[n]!, design);
      out.push({ amplitude: q, elements: [{ m, n, a: q }] });
    }
  }
  return out;
}

export function refArray(design: Design): RefArray {
  const lam = C / (design.frequencyGHz * 1e9);
  const amp = new Array<number>(design.nx * design.ny).fill(0);
  for (const ch of refChannels(design)) for (const e of ch.elements) amp[e.n * design.nx + e.m] = e.a;
  // Per-axis weights for the factorised direct sum; only valid when the amplitudes still factorise.
  let tx: ArrayLike<number> = taperWeights(design.taperX, design.nx);
  let ty: ArrayLike<number> = taperWeights(design.taperY, design.ny);
  if (design.attenuatorStepDb !== undefined) {
    tx = Array.from({ length: design.nx }, (_, m) => refAttenuate(taperWeights(design.taperX, design.nx)[m]!, design));
    ty = Array.from({ length: design.ny }, (_, n) => refAttenuate(taperWeights(design.taperY, design.ny)[n]!, design));
    if (design.grouping === 'column') ty = taperWeights(design.taperY, design.ny);
    if (design.grouping === 'row') tx = taperWeights(design.taperX, design.nx);
  }
  const factorises = amp.every((a, i) => Math.abs(a - tx[i % design.nx]! * ty[Math.floor(i / design.nx)]!) <= 1e-12);
  const ph = refPhasesDeg(design);
  const a: RefArray = { xs: [], ys: [], re: [], im: [], k: (2 * Math.PI) / lam, nx: design.nx, ny: design.ny, element: refElement(design), steer: design.codes ? { az: 0, el: 0 } : { az: design.steerAzDeg, el: design.steerElDeg } };
  for (let n = 0; n < design.ny; n++) {
    for (let m = 0; m < design.nx; m++) {
      a.xs.push((m - (design.nx - 1) / 2) * design.dxMm * 1e-3);
      a.ys.push((n - (design.ny - 1) / 2) * design.dyMm * 1e-3);
      const am = amp[n * design.nx + m]!;
      const p = ph[n * design.nx + m]! * D2R;
      a.re.push(am * Math.cos(p));
      a.im.push(am * Math.sin(p));
    }
  }
  if (design.phaseBits === null && factorises) {
    const axes = { x: [] as number[], xr: [] as number[], xi: [] as number[], y: [] as number[], yr: [] as number[], yi: [] as number[] };
    for (let m = 0; m < design.nx; m++) {
      const p = ph[m]! * D2R;
      axes.x.push(a.xs[m]!);
      axes.xr.push(tx[m]! * Math.cos(p));
      axes.xi.push(tx[m]! * Math.sin(p));
    }
    for (let n = 0; n < design.ny; n++) {
      const p = ph[n * design.nx]! * D2R;
      axes.y.push(a.ys[n * design.nx]!);
      axes.yr.push(ty[n]! * Math.cos(p));
      axes.yi.push(ty[n]! * Math.sin(p));
    }
    a.axes = axes;
  }
  return a;
}

function line(pos: number[], re: number[], im: number[], k: number, s: number): number {
  let sr = 0;
  let si = 0;
  for (let i = 0; i < pos.length; i++) {
    const c = Math.cos(k * pos[i]! * s);
    const sn = Math.sin(k * pos[i]! * s);
    sr += re[i]! * c - im[i]! * sn;
    si += re[i]! * sn + im[i]! * c;
  }
  return sr * sr + si * si;
}

/** Direct-sum |AF|² at (u, v). */
export function refAf(a: RefArray, u: number, v: number): number {
  if (a.axes) return line(a.axes.x, a.axes.xr, a.axes.xi, a.k, u) * line(a.axes.y, a.axes.yr, a.axes.yi, a.k, v);
  let sr = 0;
  let si = 0;
  for (let i = 0; i < a.re.length; i++) {
    const p = a.k * (a.xs[i]! * u + a.ys[i]! * v);
    const c = Math.cos(p);
    const s = Math.sin(p);
    sr += a.re[i]! * c - a.im[i]! * s;
    si += a.re[i]! * s + a.im[i]! * c;
  }
  return sr * sr + si * si;
}

export function refP(a: RefArray, azDeg: number, elDeg: number): number {
  const u = Math.sin(azDeg * D2R) * Math.cos(elDeg * D2R);
  const v = Math.sin(elDeg * D2R);
  return refAf(a, u, v) * a.element(azDeg, elDeg);
}

function angleDeg(az1: number, el1: number, az2: number, el2: number): number {
  const d = (az: number, el: number) => [Math.sin(az * D2R) * Math.cos(el * D2R), Math.sin(el * D2R), Math.cos(az * D2R) * Math.cos(el * D2R)];
  const p = d(az1, el1);
  const q = d(az2, el2);
  const dot = p[0]! * q[0]! + p[1]! * q[1]! + p[2]! * q[2]!;
  return Math.acos(Math.max(-1, Math.min(1, dot))) / D2R;
}

/** Peak over the front hemisphere: a coarse grid, then each good local maximum zoomed by shrinking grids. */
export function refPeak(a: RefArray, coarseDeg: number): { az: number; el: number; p: number } {
  const n = Math.round(180 / coarseDeg) + 1;
  const g: number[] = [];
  for (let j = 0; j < n; j++) for (let i = 0; i < n; i++) g.push(refP(a, -90 + i * coarseDeg, -90 + j * coarseDeg));
  let max = 0;
  for (const x of g) max = Math.max(max, x);
  const starts: { az: number; el: number; p: number }[] = [];
  for (let j = 0; j < n; j++) {
    for (let i = 0; i < n; i++) {
      const x = g[j * n + i]!;
      if (x < 0.2 * max) continue;
      let ok = true;
      for (let dj = -1; dj <= 1; dj++) for (let di = -1; di <= 1; di++) {
        const ii = i + di, jj = j + dj;
        if (ii >= 0 && jj >= 0 && ii < n && jj < n && g[jj * n + ii]! > x) ok = false;
      }
      if (ok) starts.push({ az: -90 + i * coarseDeg, el: -90 + j * coarseDeg, p: x });
    }
  }
  starts.sort((p, q) => q.p - p.p);
  const results = starts.slice(0, 16).map((s) => {
    let { az, el } = s;
    let h = coarseDeg;
    while (h > 2e-5) {
      let best = { az, el, p: refP(a, az, el) };
      for (let dj = -5; dj <= 5; dj++) for (let di = -5; di <= 5; di++) {
        const aa = Math.max(-90, Math.min(90, az + (di * h) / 2.5));
        const ee = Math.max(-90, Math.min(90, el + (dj * h) / 2.5));
        const p = refP(a, aa, ee);
        if (p > best.p) best = { az: aa, el: ee, p };
      }
      az = best.az;
      el = best.el;
      h /= 3;
    }
    return { az, el, p: refP(a, az, el) };
  });
  let best = results[0]!;
  for (const r of results) {
    const tie = Math.abs(r.p - best.p) <= 1e-6 * Math.max(r.p, best.p);
    if ((tie && angleDeg(r.az, r.el, a.steer.az, a.steer.el) < angleDeg(best.az, best.el, a.steer.az, a.steer.el)) || (!tie && r.p > best.p)) best = r;
  }
  return best;
}

/** HPBW, clipping and SLL of a cut sampled every stepDeg (linear interpolation of the half-power points). */
export function refCut(f: (deg: number) => number, peakDeg: number, peakP: number, stepDeg: number) {
  const n = Math.round(180 / stepDeg) + 1;
  const ang: number[] = [];
  const s: number[] = [];
  for (let i = 0; i < n; i++) {
    ang.push(-90 + (180 * i) / (n - 1));
    s.push(f(ang[i]!));
  }
  let ip = 0;
  for (let i = 0; i < n; i++) if (Math.abs(ang[i]! - peakDeg) < Math.abs(ang[ip]! - peakDeg)) ip = i;
  const half = peakP / 2;
  const edge = (dir: number) => {
    for (let i = ip + dir; i >= 0 && i < n; i += dir) {
      if (s[i]! < half) {
        const j = i - dir;
        const t = (s[j]! - half) / (s[j]! - s[i]!);
        return { a: ang[j]! + t * (ang[i]! - ang[j]!), clipped: false };
      }
    }
    return { a: dir * 90, clipped: true };
  };
  const lo = edge(-1);
  const hi = edge(1);
  const minEdge = (dir: number) => {
    for (let i = ip + dir; i + dir >= 0 && i + dir < n; i += dir) if (s[i + dir]! > s[i]! * (1 + 1e-9)) return i;
    return dir > 0 ? n - 1 : 0;
  };
  const L = minEdge(-1);
  const R = minEdge(1);
  let sl = -Infinity;
  for (let i = 0; i < n; i++) {
    if (i >= L && i <= R) continue;
    const left = i === 0 ? -Infinity : s[i - 1]!;
    const right = i === n - 1 ? -Infinity : s[i + 1]!;
    if (s[i]! > left && s[i]! >= right) sl = Math.max(sl, s[i]!);
  }
  return { hpbw: hi.a - lo.a, clipped: lo.clipped || hi.clipped, sllDb: sl > 0 ? 10 * Math.log10(sl / peakP) : null };
}

/** ∮ P dΩ by the midpoint rule over az ∈ [-180°, 180°) and v = sin(el) ∈ [-1, 1] (dΩ = d(az)·dv). */
export function refSpherePower(a: RefArray, naz: number, nv: number): number {
  let total = 0;
  const colRe = new Float64Array(a.nx);
  const colIm = new Float64Array(a.nx);
  for (let j = 0; j < nv; j++) {
    const v = -1 + (2 * (j + 0.5)) / nv;
    const el = Math.asin(v) / D2R;
    const ce = Math.sqrt(1 - v * v);
    // Sum the y part once per row of the grid (a reorganised direct sum).
    colRe.fill(0);
    colIm.fill(0);
    for (let n = 0; n < a.ny; n++) for (let m = 0; m < a.nx; m++) {
      const i = n * a.nx + m;
      const p = a.k * a.ys[i]! * v;
      colRe[m] = colRe[m]! + a.re[i]! * Math.cos(p) - a.im[i]! * Math.sin(p);
      colIm[m] = colIm[m]! + a.re[i]! * Math.sin(p) + a.im[i]! * Math.cos(p);
    }
    for (let i = 0; i < naz; i++) {
      const az = -180 + (360 * (i + 0.5)) / naz;
      const u = Math.sin(az * D2R) * ce;
      let sr = 0;
      let si = 0;
      for (let m = 0; m < a.nx; m++) {
        const p = a.k * a.xs[m]! * u;
        const c = Math.cos(p);
        const s = Math.sin(p);
        sr += colRe[m]! * c - colIm[m]! * s;
        si += colRe[m]! * s + colIm[m]! * c;
      }
      total += (sr * sr + si * si) * a.element(az, el);
    }
  }
  return total * ((2 * Math.PI) / naz) * (2 / nv);
}

export interface RefMetrics {
  peakAzDeg: number;
  peakElDeg: number;
  hpbwAzDeg: number;
  hpbwElDeg: number;
  hpbwAzClipped: boolean;
  hpbwElClipped: boolean;
  sllAzDb: number | null;
  sllElDb: number | null;
  directivityDbi: number;
  elementGainDbi: number;
  gainDbi: number;
  gainAtSteerDbi: number | null;
  pointingLossDb: number | null;
  scanLossDb: number;
  conductedPowerDbm: number | null;
  eirpDbm: number | null;
  eirpAtSteerDbm: number | null;
  pointingErrorDeg: number | null;
  taperEfficiencyDb: number;
  gratingLobeOnsetAzDeg: number | null;
  gratingLobeOnsetElDeg: number | null;
}

/** Angle in degrees between two (az, el) directions, from their unit vectors (u, v, w). */
function refAngleDeg(az1: number, el1: number, az2: number, el2: number): number {
  const vec = (az: number, el: number) => [Math.sin(az * D2R) * Math.cos(el * D2R), Math.sin(el * D2R), Math.cos(az * D2R) * Math.cos(el * D2R)];
  const [a, b] = [vec(az1, el1), vec(az2, el2)];
  const dot = a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]!;
  return Math.acos(Math.max(-1, Math.min(1, dot))) / D2R;
}

/** (Σw)²/(N·Σw²) of the taper product over every element, in dB (the taper as designed, before any attenuator). */
function refTaperEfficiencyDb(design: Design): number {
  const tx = taperWeights(design.taperX, design.nx);
  const ty = taperWeights(design.taperY, design.ny);
  let s1 = 0;
  let s2 = 0;
  for (let n = 0; n < design.ny; n++) for (let m = 0; m < design.nx; m++) {
    const w = tx[m]! * ty[n]!;
    s1 += w;
    s2 += w * w;
  }
  return 10 * Math.log10((s1 * s1) / (design.nx * design.ny * s2));
}

/**
 * Smallest steer from broadside (degrees) at which the first lattice copy of the beam, at sin θ0 − λ/d, is inside
 * the visible region, found by bisection on that visibility test; null for an axis of one element.
 */
function refGratingOnsetDeg(n: number, pitchMm: number, lambdaMm: number): number | null {
  if (n <= 1) return null;
  const visible = (deg: number) => Math.abs(Math.sin(deg * D2R) - lambdaMm / pitchMm) <= 1;
  if (visible(0)) return 0;
  let lo = 0;
  let hi = 90;
  if (!visible(hi)) return 90;
  for (let i = 0; i < 60; i++) {
    const mid = (lo + hi) / 2;
    if (visible(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

/** Element gain defaults written out again: isotropic 0, cos^q θ 2(q + 1), TR 38.901 8 dBi; element.gainDbi wins. */
function refElementGainDbi(design: Design): number {
  const e = design.element;
  if (e.gainDbi !== undefined) return e.gainDbi;
  if (e.kind === 'cosine') return 10 * Math.log10(2 * (e.q + 1));
  if (e.kind === 'tr38901') return 8;
  if (e.kind === 'table') return 10 * Math.log10(refTable(e.pattern!)(0, 0));
  return 0;
}

/** G(az, el) = G_e0·E(az, el)/E(0, 0)·|AF|²/Σa² by direct sums over the reference array, dBi. */
function refGainDbi(a: RefArray, ge0Dbi: number, azDeg: number, elDeg: number): number {
  let s2 = 0;
  for (let i = 0; i < a.re.length; i++) s2 += a.re[i]! * a.re[i]! + a.im[i]! * a.im[i]!;
  const g = (Math.pow(10, ge0Dbi / 10) * refP(a, azDeg, elDeg)) / (a.element(0, 0) * s2);
  return 10 * Math.log10(Math.max(g, 1e-30));
}

export function refMetrics(design: Design, opts: { coarseDeg: number; cutStepDeg: number; naz: number; nv: number }): RefMetrics {
  const a = refArray(design);
  const pk = refPeak(a, opts.coarseDeg);
  const az = refCut((x) => refP(a, x, pk.el), pk.az, pk.p, opts.cutStepDeg);
  const el = refCut((x) => refP(a, pk.az, x), pk.el, pk.p, opts.cutStepDeg);
  const ge = refElementGainDbi(design);
  const gain = refGainDbi(a, ge, pk.az, pk.el);
  const atSteer = design.codes ? null : refGainDbi(a, ge, design.steerAzDeg, design.steerElDeg);
  // Broadside: the same amplitudes with every phase zero, summed directly.
  let s1 = 0;
  let s2 = 0;
  for (let i = 0; i < a.re.length; i++) {
    const m2 = a.re[i]! * a.re[i]! + a.im[i]! * a.im[i]!;
    s1 += Math.sqrt(m2);
    s2 += m2;
  }
  const broadside = ge + 10 * Math.log10((s1 * s1) / s2);
  let chPower = 0;
  for (const ch of refChannels(design)) chPower += ch.amplitude * ch.amplitude;
  const conducted = design.channelPowerDbm === null ? null : design.channelPowerDbm + 10 * Math.log10(chPower);
  return {
    elementGainDbi: ge,
    gainDbi: gain,
    gainAtSteerDbi: atSteer,
    pointingLossDb: atSteer === null ? null : gain - atSteer,
    scanLossDb: broadside - gain,
    conductedPowerDbm: conducted,
    eirpDbm: conducted === null ? null : conducted + gain,
    eirpAtSteerDbm: conducted === null || atSteer === null ? null : conducted + atSteer,
    peakAzDeg: pk.az,
    peakElDeg: pk.el,
    hpbwAzDeg: az.hpbw,
    hpbwElDeg: el.hpbw,
    hpbwAzClipped: az.clipped,
    hpbwElClipped: el.clipped,
    sllAzDb: az.sllDb,
    sllElDb: el.sllDb,
    directivityDbi: 10 * Math.log10((4 * Math.PI * pk.p) / refSpherePower(a, opts.naz, opts.nv)),
    pointingErrorDeg: design.codes ? null : refAngleDeg(pk.az, pk.el, design.steerAzDeg, design.steerElDeg),
    taperEfficiencyDb: refTaperEfficiencyDb(design),
    gratingLobeOnsetAzDeg: refGratingOnsetDeg(design.nx, design.dxMm, (C / (design.frequencyGHz * 1e9)) * 1e3),
    gratingLobeOnsetElDeg: refGratingOnsetDeg(design.ny, design.dyMm, (C / (design.frequencyGHz * 1e9)) * 1e3),
  };
}
