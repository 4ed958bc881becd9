import { channelCount, type Design } from '../schemas/design.ts';
import { arrayModel } from './array/array-model.ts';
import { arrayPower } from './array/array-power.ts';
import { DEG_PER_RAD, RAD_PER_DEG } from './constants.ts';
import { beamCuts } from './cut/beam-cuts.ts';
import { designWarnings } from './design-warnings.ts';
import { broadsideDirectivityDbi } from './directivity/broadside-directivity.ts';
import { directivityDbi } from './directivity/directivity-dbi.ts';
import { gratingLobeOnsetDeg } from './grating/grating-lobe-onset.ts';
import { impliedBeam } from './grating/implied-beam.ts';
import { latticeCopyVisible } from './grating/lattice-copy-visible.ts';
import type { Metrics } from './metrics.ts';
import { elementPhases } from './phase/element-phases.ts';
import { findPeak } from './search/find-peak.ts';
import { refinePeak } from './search/refine-peak.ts';
import { taperEfficiencyDb } from './taper/taper-efficiency.ts';
import { taperWeights } from './taper/taper-weights.ts';
import { angleBetweenRad, directionOf } from './units/direction.ts';
import { wavelengthMm } from './units/wavelength-mm.ts';

/** Every metric of one design at its steer (or its explicit codes). Pure; geometry-only work is memoised. */
export function evaluateDesign(design: Design): Metrics {
  const lambdaMm = wavelengthMm(design.frequencyGHz);
  const dxL = design.dxMm / lambdaMm;
  const dyL = design.dyMm / lambdaMm;
  const { nx, ny } = design;
  const { phaseRad, codes } = elementPhases(design);
  const model = arrayModel(design, phaseRad);
  const coded = design.codes !== null;
  // Ties go to the intended beam: the steer, or broadside when explicit codes are given.
  const steer = coded ? directionOf(0, 0) : directionOf(design.steerAzDeg * RAD_PER_DEG, design.steerElDeg * RAD_PER_DEG);
  const peak = findPeak(model, steer);
  const peakDir = directionOf(peak.azRad, peak.elRad);
  const cuts = beamCuts(model, peak);
  const directivity = directivityDbi(model, design.element, peak.power);
  // Grating lobes are copies of the ideal steer, or with codes of the array factor's own maximum.
  let ref = { u: steer.u, v: steer.v };
  if (coded) {
    const af = refinePeak((u, v) => arrayPower(model, u, v), peakDir.u, peakDir.v, 0.05);
    ref = { u: af.azRad, v: af.elRad };
  }
  const gratingLobeVisible = latticeCopyVisible(ref.u, ref.v, nx, ny, dxL, dyL);
  const implied = impliedBeam(model);
  const pointingErrorDeg = coded ? null : angleBetweenRad(peakDir, steer) * DEG_PER_RAD;
  const sll = [cuts.az.sllDb, cuts.el.sllDb].filter((x): x is number => x !== null);
  const channels = channelCount(design.grouping, nx, ny);
  return {
    peakAzDeg: peak.azRad * DEG_PER_RAD,
    peakElDeg: peak.elRad * DEG_PER_RAD,
    pointingErrorDeg,
    hpbwAzDeg: cuts.az.hpbwDeg,
    hpbwElDeg: cuts.el.hpbwDeg,
    hpbwAzClipped: cuts.az.clipped,
    hpbwElClipped: cuts.el.clipped,
    sllAzDb: cuts.az.sllDb,
    sllElDb: cuts.el.sllDb,
    peakSllDb: sll.length > 0 ? Math.max(...sll) : null,
    directivityDbi: directivity,
    scanLossDb: broadsideDirectivityDbi(design) - directivity,
    taperEfficiencyDb: taperEfficiencyDb(taperWeights(design.taperX, nx)) + taperEfficiencyDb(taperWeights(design.taperY, ny)),
    gratingLobeOnsetAzDeg: gratingLobeOnsetDeg(nx, dxL),
    gratingLobeOnsetElDeg: gratingLobeOnsetDeg(ny, dyL),
    gratingLobeVisible,
    channels,
    apertureXMm: nx * design.dxMm,
    apertureYMm: ny * design.dyMm,
    codes,
    eirpDbm: design.channelPowerDbm === null ? null : design.channelPowerDbm + 10 * Math.log10(channels) + directivity,
    warnings: designWarnings({
      beamVisible: latticeCopyVisible(implied.u, implied.v, nx, ny, dxL, dyL, true),
      gratingLobeVisible,
      azClipped: cuts.az.clipped,
      elClipped: cuts.el.clipped,
      pointingErrorDeg,
      hpbwAzDeg: cuts.az.hpbwDeg,
      hpbwElDeg: cuts.el.hpbwDeg,
    }),
  };
}
