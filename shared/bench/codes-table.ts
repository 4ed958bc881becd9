import { channelCount, type Design } from '../schemas/design.ts';
import { RAD_PER_DEG } from '../engine/constants.ts';
import { directionOf } from '../engine/units/direction.ts';
import { wavelengthMm } from '../engine/units/wavelength-mm.ts';
import { appliedPhaseRad, beamCodes, channelAmplitude } from './beam-codes.ts';
import type { Beam } from './beam.ts';
import { benchModel } from './bench-model.ts';
import { offsetArrays, type Calibration, type OffsetArrays } from './calibration.ts';
import { beamWarnings, type BenchWarning } from './beam-warnings.ts';
import { beamFigures, type BeamFigures } from '../engine/beam-figures.ts';
import { attenuatorCodes } from '../engine/gain/channel-amplitudes.ts';
import { channelOfElement } from './bench-model.ts';

export interface CodesRow {
  azDeg: number;
  elDeg: number;
  codes: number[];
  peakAzDeg: number;
  peakElDeg: number;
  pointingErrorDeg: number;
  hpbwAzDeg: number;
  hpbwElDeg: number;
  sllAzDb: number | null;
  sllElDb: number | null;
  warnings: BenchWarning[];
}

/** What the bench needs to load the codes right: which candidate, at what frequency, with which step sizes. */
export interface CodesHeader {
  /** The candidate's name (filled by the caller that knows it), or null. */
  candidate: string | null;
  frequencyGHz: number;
  phaseBits: number;
  phaseStepDeg: number;
  /** Null when the design has continuous amplitude (no attenuator). */
  attenuatorBits: number | null;
  attenuatorStepDb: number | null;
  grouping: Design['grouping'];
  nx: number;
  ny: number;
}

export interface CodesTable {
  header: CodesHeader;
  /** Attenuator code per channel (the taper, quantised; the same for every beam), or null without an attenuator. */
  attenuation: number[] | null;
  /** The elements each channel feeds, as [m, n] (column, row from the -x/-y corner), channel order as the codes. */
  channelElements: [number, number][][];
  channels: number;
  phaseBits: number;
  calibrated: boolean;
  pointingThresholdDeg: number | null;
  rows: CodesRow[];
}

/** Prediction for codes loaded into the design's channels, with the calibration gains and phases applied. */
export function predictCodes(design: Design, codes: readonly number[], offsets: OffsetArrays | undefined, intended: Beam | null): BeamFigures {
  const channels = channelCount(design.grouping, design.nx, design.ny);
  const model = benchModel(design, appliedPhaseRad(design, codes, offsets), channelAmplitude(offsets, channels));
  const lambdaMm = wavelengthMm(design.frequencyGHz);
  const dir = intended ? directionOf(intended.azDeg * RAD_PER_DEG, intended.elDeg * RAD_PER_DEG) : null;
  return beamFigures(model, dir, { dx: design.dxMm / lambdaMm, dy: design.dyMm / lambdaMm });
}

/**
 * Bench codes: the phase code of every channel for each beam, with the predicted peak, pointing error,
 * HPBW and warnings. With calibration, the codes compensate the measured phase offsets and the
 * prediction includes both the gain and the (residual) phase offsets. The header names the candidate, frequency
 * and step sizes; with an attenuator each channel's attenuation code sits beside the phase codes.
 */
export function codesTable(
  design: Design,
  beams: readonly Beam[],
  options: { calibration?: Calibration | null; pointingThresholdDeg?: number | null; candidate?: string | null } = {},
): CodesTable {
  const channels = channelCount(design.grouping, design.nx, design.ny);
  const calibrated = (options.calibration?.length ?? 0) > 0;
  const offsets = calibrated ? offsetArrays(options.calibration, channels) : undefined;
  const threshold = options.pointingThresholdDeg ?? null;
  const rows = beams.map((beam, i): CodesRow => {
    const codes = beamCodes(design, beam, offsets, `beams[${i}]`);
    const p = predictCodes(design, codes, offsets, beam);
    return {
      azDeg: beam.azDeg,
      elDeg: beam.elDeg,
      codes,
      peakAzDeg: p.peakAzDeg,
      peakElDeg: p.peakElDeg,
      pointingErrorDeg: p.pointingErrorDeg ?? 0,
      hpbwAzDeg: p.hpbwAzDeg,
      hpbwElDeg: p.hpbwElDeg,
      sllAzDb: p.sllAzDb,
      sllElDb: p.sllElDb,
      warnings: beamWarnings(p, threshold),
    };
  });
  const phaseBits = design.phaseBits ?? 0;
  const channelElements: [number, number][][] = Array.from({ length: channels }, () => []);
  for (let n = 0; n < design.ny; n++) for (let m = 0; m < design.nx; m++) channelElements[channelOfElement(design, m, n)]!.push([m, n]);
  const header: CodesHeader = {
    candidate: options.candidate ?? null,
    frequencyGHz: design.frequencyGHz,
    phaseBits,
    phaseStepDeg: phaseBits > 0 ? 360 / 2 ** phaseBits : 0,
    attenuatorBits: design.attenuatorBits ?? null,
    attenuatorStepDb: design.attenuatorStepDb ?? null,
    grouping: design.grouping,
    nx: design.nx,
    ny: design.ny,
  };
  return { header, attenuation: attenuatorCodes(design), channelElements, channels, phaseBits, calibrated, pointingThresholdDeg: threshold, rows };
}
