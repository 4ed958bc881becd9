import { channelCount, type Design } from '../schemas/design.ts';
import { arrayModel } from './array/array-model.ts';
import { beamFigures } from './beam-figures.ts';
import { RAD_PER_DEG } from './constants.ts';
import { designWarnings } from './design-warnings.ts';
import { directivityDbi } from './directivity/directivity-dbi.ts';
import { conductedPowerDbm } from './gain/conducted-power-dbm.ts';
import { elementGainDbi } from './gain/element-gain-dbi.ts';
import { gainScale } from './gain/gain-scale.ts';
import { unitCellGainDbi } from './gain/unit-cell-gain-dbi.ts';
import { gratingLobeOnsetDeg } from './grating/grating-lobe-onset.ts';
import type { Metrics } from './metrics.ts';
import { patternPower } from './array/array-power.ts';
import { elementPhases } from './phase/element-phases.ts';
import { taperEfficiencyDb } from './taper/taper-efficiency.ts';
import { taperWeights } from './taper/taper-weights.ts';
import { directionOf } from './units/direction.ts';
import { wavelengthMm } from './units/wavelength-mm.ts';

/** Every metric of one design at its steer (or its explicit codes). Pure; geometry-only work is memoised. */
export function evaluateDesign(design: Design): Metrics {
  const lambdaMm = wavelengthMm(design.frequencyGHz);
  const dxL = design.dxMm / lambdaMm;
  const dyL = design.dyMm / lambdaMm;
  const { nx, ny } = design;
  const { phaseRad, codes } = elementPhases(design);
  const model = arrayModel(design, phaseRad);
  // With explicit codes no beam is intended: ties go to broadside and grating lobes copy the AF maximum.
  const intended = design.codes !== null ? null : directionOf(design.steerAzDeg * RAD_PER_DEG, design.steerElDeg * RAD_PER_DEG);
  const beam = beamFigures(model, intended, { dx: dxL, dy: dyL });
  const directivity = directivityDbi(model, design.element, beam.peakPower);
  const sll = [beam.sllAzDb, beam.sllElDb].filter((x): x is number => x !== null);
  const channels = channelCount(design.grouping, nx, ny);
  // Gain is the pattern power rescaled (one factor), so the peak search above serves it; toward the steer is one more sample.
  const ge = elementGainDbi(design.element);
  const scale = gainScale(model, ge);
  const gain = 10 * Math.log10(scale.perPower * beam.peakPower);
  const steerPower = design.codes !== null ? null : patternPower(model, design.steerAzDeg * RAD_PER_DEG, design.steerElDeg * RAD_PER_DEG);
  // A steer into an element null has no finite gain; -300 dBi keeps every figure a JSON number.
  const gainAtSteer = steerPower === null ? null : 10 * Math.log10(Math.max(scale.perPower * steerPower, 1e-30));
  const conducted = conductedPowerDbm(design);
  return {
    peakAzDeg: beam.peakAzDeg,
    peakElDeg: beam.peakElDeg,
    pointingErrorDeg: beam.pointingErrorDeg,
    hpbwAzDeg: beam.hpbwAzDeg,
    hpbwElDeg: beam.hpbwElDeg,
    hpbwAzClipped: beam.hpbwAzClipped,
    hpbwElClipped: beam.hpbwElClipped,
    sllAzDb: beam.sllAzDb,
    sllElDb: beam.sllElDb,
    peakSllDb: sll.length > 0 ? Math.max(...sll) : null,
    directivityDbi: directivity,
    elementGainDbi: ge,
    gainDbi: gain,
    gainAtSteerDbi: gainAtSteer,
    pointingLossDb: gainAtSteer === null ? null : gain - gainAtSteer,
    scanLossDb: scale.broadsideDbi - gain,
    taperEfficiencyDb: taperEfficiencyDb(taperWeights(design.taperX, nx)) + taperEfficiencyDb(taperWeights(design.taperY, ny)),
    gratingLobeOnsetAzDeg: gratingLobeOnsetDeg(nx, dxL),
    gratingLobeOnsetElDeg: gratingLobeOnsetDeg(ny, dyL),
    gratingLobeVisible: beam.gratingLobeVisible,
    channels,
    apertureXMm: nx * design.dxMm,
    apertureYMm: ny * design.dyMm,
    codes,
    conductedPowerDbm: conducted,
    eirpDbm: conducted === null ? null : conducted + gain,
    eirpAtSteerDbm: conducted === null || gainAtSteer === null ? null : conducted + gainAtSteer,
    warnings: designWarnings({
      beamVisible: beam.beamVisible,
      gratingLobeVisible: beam.gratingLobeVisible,
      azClipped: beam.hpbwAzClipped,
      elClipped: beam.hpbwElClipped,
      pointingErrorDeg: beam.pointingErrorDeg,
      hpbwAzDeg: beam.hpbwAzDeg,
      hpbwElDeg: beam.hpbwElDeg,
      elementGainDbi: ge,
      unitCellGainDbi: nx > 1 && ny > 1 ? unitCellGainDbi(design.dxMm, design.dyMm, lambdaMm) : null,
    }),
  };
}
