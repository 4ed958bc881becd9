/**
 * What a loaded set of codes does: the engine's own peak search, cuts, directivity and grating-lobe
 * checks run on a bench model (codes, calibration gains and phases already in the excitations).
 */
import type { ArrayModel } from '../engine/array/array-model.ts';
import { arrayPower } from '../engine/array/array-power.ts';
import { DEG_PER_RAD } from '../engine/constants.ts';
import { beamCuts } from '../engine/cut/beam-cuts.ts';
import { impliedBeam } from '../engine/grating/implied-beam.ts';
import { latticeCopyVisible } from '../engine/grating/lattice-copy-visible.ts';
import { findPeak } from '../engine/search/find-peak.ts';
import { refinePeak } from '../engine/search/refine-peak.ts';
import { angleBetweenRad, directionOf, type Direction } from '../engine/units/direction.ts';

export interface BeamPrediction {
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
 * and grating lobes are copies of the array factor's own maximum, as in the engine contract.
 */
export function predictBeam(model: ArrayModel, intended: Direction | null, pitchWavelengths: { dx: number; dy: number }): BeamPrediction {
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
