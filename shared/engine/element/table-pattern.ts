import type { ElementPattern } from '../../schemas/element-pattern.ts';
import { DEG_PER_RAD } from '../constants.ts';

/** A pattern's grid in the form the hot loops read: linear power, regular axes in radians. */
interface TableGrid {
  az0: number;
  dAz: number;
  nAz: number;
  /** The axis wraps round (it spans the whole circle with one step to spare, e.g. -180..179). */
  periodic: boolean;
  el0: number;
  dEl: number;
  nEl: number;
  power: Float64Array;
}

const grids = new WeakMap<ElementPattern, TableGrid>();

function gridOf(p: ElementPattern): TableGrid {
  let g = grids.get(p);
  if (g) return g;
  const nAz = p.azDeg.length;
  const nEl = p.elDeg.length;
  if (nAz < 2 || nEl < 2 || p.gainDbi.length !== nAz * nEl) throw new RangeError('invalid element pattern grid');
  const dAzDeg = (p.azDeg[nAz - 1]! - p.azDeg[0]!) / (nAz - 1);
  g = {
    az0: p.azDeg[0]! / DEG_PER_RAD,
    dAz: dAzDeg / DEG_PER_RAD,
    nAz,
    periodic: Math.abs(nAz * dAzDeg - 360) < 1e-6,
    el0: p.elDeg[0]! / DEG_PER_RAD,
    dEl: (p.elDeg[nEl - 1]! - p.elDeg[0]!) / (nEl - 1) / DEG_PER_RAD,
    nEl,
    power: Float64Array.from(p.gainDbi, (db) => 10 ** (db / 10)),
  };
  grids.set(p, g);
  return g;
}

/** Bilinear interpolation of one of the grid's value arrays; 0 outside the azimuths the table covers. */
function interpolate(g: TableGrid, values: Float64Array, azRad: number, elRad: number, outside: number): number {
  let s = (azRad - g.az0) / g.dAz;
  if (g.periodic) s = ((s % g.nAz) + g.nAz) % g.nAz;
  else if (s < -1e-9 || s > g.nAz - 1 + 1e-9) return outside;
  const t = Math.min(Math.max((elRad - g.el0) / g.dEl, 0), g.nEl - 1);
  let i = Math.floor(s);
  let j = Math.floor(t);
  const i1 = g.periodic ? (i + 1) % g.nAz : Math.min(i + 1, g.nAz - 1);
  if (!g.periodic && i > g.nAz - 1) i = g.nAz - 1;
  if (j > g.nEl - 2) j = g.nEl - 2;
  const fs = Math.min(Math.max(s - i, 0), 1);
  const ft = t - j;
  const r0 = j * g.nAz;
  const r1 = r0 + g.nAz;
  const a = values[r0 + i]! + fs * (values[r0 + i1]! - values[r0 + i]!);
  const b = values[r1 + i]! + fs * (values[r1 + i1]! - values[r1 + i]!);
  return a + ft * (b - a);
}

/** Linear power gain of a table element at (az, el) in radians, bilinear in az/el; nothing outside its azimuths. */
export function tablePower(pattern: ElementPattern): (azRad: number, elRad: number) => number {
  const g = gridOf(pattern);
  return (azRad, elRad) => interpolate(g, g.power, azRad, elRad, 0);
}

/** The table's own gain in dBi at (az, el) in radians (linear interpolation of power, shown in dB). */
export function tablePatternDbiAt(pattern: ElementPattern, azRad: number, elRad: number): number {
  const g = gridOf(pattern);
  return 10 * Math.log10(interpolate(g, g.power, azRad, elRad, 0));
}

/** A short stable key for memo tables: the pattern's id-free fingerprint (FNV-1a over its numbers), once per object. */
const keys = new WeakMap<ElementPattern, string>();
export function tablePatternKey(pattern: ElementPattern): string {
  let k = keys.get(pattern);
  if (k) return k;
  let h = 0x811c9dc5;
  const mix = (x: number) => {
    const s = x.toString();
    for (let i = 0; i < s.length; i++) h = Math.imul(h ^ s.charCodeAt(i), 0x01000193) >>> 0;
    h = Math.imul(h ^ 44, 0x01000193) >>> 0;
  };
  for (const x of pattern.azDeg) mix(x);
  for (const x of pattern.elDeg) mix(x);
  for (const x of pattern.gainDbi) mix(x);
  k = `table|${pattern.azDeg.length}x${pattern.elDeg.length}|${h.toString(16)}`;
  keys.set(pattern, k);
  return k;
}
