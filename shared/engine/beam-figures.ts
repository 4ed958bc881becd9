/**
 * The beam of an array model: peak search, cuts through the peak, pointing error and grating-lobe checks.
 * evaluateDesign uses it for a design's own excitations, and the bench tools for loaded codes with
 * calibration gains and phases already in the excitations.
 */
import type { ArrayModel } from './array/array-model.ts';
import { arrayPower } from './array/array-power.ts';
import { DEG_PER_RAD } from './constants.ts';
import { beamCuts } from './cut/beam-cuts.ts';
import { impliedBeam } from './grating/implied-beam.ts';
import { latticeCopyVisible } from './grating/lattice-copy-visible.ts';
import { findPeak } from './search/find-peak.ts';
import { refinePeak } from './search/refine-peak.ts';
import { angleBetweenRad, directionOf, type Direction } from './units/direction.ts';

export interface BeamFigures {
  peakAzDeg: number;
  peakElDeg: number;
  /** Angle between the peak and the intended beam; null when no beam was intended (manual codes). */
  pointingErrorDeg: number | null;
  hpbwAzDeg: number;
  hpbwElDeg: number;
  hpbwAzClipped: boolean;
  hpbwElClipped: boolean;
  sllAzDb: number | null;
  sllElDb: number | null;
  beamVisible: boolean;
  gratingLobeVisible: boolean;
  peakPower: number;
}

/**
 * Peak, pointing error, HPBW and side lobes of a model. `intended` settles peak ties and is the
 * reference of the pointing error and of grating lobes; without it (manual codes) ties go to broadside
 * and grating lobes are copies of the array factor's own maximum, by the engine's tie rules.
 */
export function beamFigures(model: ArrayModel, intended: Direction | null, pitchWavelengths: { dx: number; dy: number }): BeamFigures {
  const reference = intended ?? directionOf(0, 0);
  const peak = findPeak(model, reference);
  const peakDir = directionOf(peak.azRad, peak.elRad);
  const cuts = beamCuts(model, peak);
  let ref = { u: reference.u, v: reference.v };
  if (intended === null) {
    const af = refinePeak((u, v) => arrayPower(model, u, v), peakDir.u, peakDir.v, 0.05);
    ref = { u: af.azRad, v: af.elRad };
  }
  const implied = impliedBeam(model);
  const { nx, ny } = model;
  return {
    peakAzDeg: peak.azRad * DEG_PER_RAD,
    peakElDeg: peak.elRad * DEG_PER_RAD,
    pointingErrorDeg: intended === null ? null : angleBetweenRad(peakDir, intended) * DEG_PER_RAD,
    hpbwAzDeg: cuts.az.hpbwDeg,
    hpbwElDeg: cuts.el.hpbwDeg,
    hpbwAzClipped: cuts.az.clipped,
    hpbwElClipped: cuts.el.clipped,
    sllAzDb: cuts.az.sllDb,
    sllElDb: cuts.el.sllDb,
    beamVisible: latticeCopyVisible(implied.u, implied.v, nx, ny, pitchWavelengths.dx, pitchWavelengths.dy, true),
    gratingLobeVisible: latticeCopyVisible(ref.u, ref.v, nx, ny, pitchWavelengths.dx, pitchWavelengths.dy),
    peakPower: peak.power,
  };
}
