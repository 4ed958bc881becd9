import type { EngineWarning } from './metrics.ts';

export interface WarningFacts {
  beamVisible: boolean;
  gratingLobeVisible: boolean;
  azClipped: boolean;
  elClipped: boolean;
  pointingErrorDeg: number | null;
  hpbwAzDeg: number;
  hpbwElDeg: number;
  /** The element gain used and what a planar lattice's unit cell supports (null for a line of elements). */
  elementGainDbi: number;
  unitCellGainDbi: number | null;
}

/** The warnings for one point, from facts the evaluation already measured. */
export function designWarnings(f: WarningFacts): EngineWarning[] {
  const out: EngineWarning[] = [];
  if (!f.beamVisible) {
    out.push({
      code: 'beam-beyond-visible',
      message: 'the progressive phase puts the intended main beam beyond the visible region (past endfire)',
    });
  }
  if (f.gratingLobeVisible) out.push({ code: 'grating-lobe-visible', message: 'a grating lobe lies in the visible region at this steer' });
  if (f.azClipped || f.elClipped) {
    const cut = f.azClipped && f.elClipped ? 'az and el cuts' : f.azClipped ? 'az cut' : 'el cut';
    out.push({ code: 'beam-clipped', message: `the main beam meets the horizon in the ${cut}; its width is measured to the horizon` });
  }
  if (f.pointingErrorDeg !== null && f.pointingErrorDeg > 0.5 * Math.min(f.hpbwAzDeg, f.hpbwElDeg)) {
    out.push({ code: 'peak-off-steer', message: `the pattern peak is ${f.pointingErrorDeg.toFixed(1)}° from the intended steer, more than half the beamwidth` });
  }
  if (f.unitCellGainDbi !== null && f.elementGainDbi > f.unitCellGainDbi + 0.05) {
    out.push({
      code: 'element-gain-above-unit-cell',
      message: `the element gain ${f.elementGainDbi.toFixed(1)} dBi exceeds the ${f.unitCellGainDbi.toFixed(1)} dBi its unit cell can support (4π·dx·dy/λ²); the gain figures are optimistic`,
    });
  }
  return out;
}
