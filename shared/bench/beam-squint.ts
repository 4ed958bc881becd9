import { channelCount, type Design } from '../schemas/design.ts';
import { patternPower } from '../engine/array/array-power.ts';
import { DEG_PER_RAD, RAD_PER_DEG } from '../engine/constants.ts';
import { directivityDbi } from '../engine/directivity/directivity-dbi.ts';
import { findPeak } from '../engine/search/find-peak.ts';
import { angleBetweenRad, directionOf } from '../engine/units/direction.ts';
import { channelAmplitude } from './beam-codes.ts';
import type { Beam } from './beam.ts';
import { beamPhases } from './beam-phases.ts';
import { benchModel } from './bench-model.ts';
import type { OffsetArrays } from './calibration.ts';

export interface SquintPoint {
  frequencyGHz: number;
  peakAzDeg: number;
  peakElDeg: number;
  /** Angle between this frequency's peak and the peak at the design frequency. */
  squintDeg: number;
  /** Angle between this frequency's peak and the intended beam. */
  pointingErrorDeg: number;
  /** Directivity toward the intended beam (dBi): what a link in that direction sees. */
  gainTowardDbi: number;
  peakDirectivityDbi: number;
}

export interface SquintResult {
  beam: Beam;
  designFrequencyGHz: number;
  codes: number[] | null;
  points: SquintPoint[];
  worstSquintDeg: number;
  worstSquintAtGHz: number;
  /** Largest drop of the gain toward the intended beam below its value at the design frequency (dB). */
  worstGainDropDb: number;
}

/**
 * Beam squint of phase-shifter steering: the phases (codes) are set for the design frequency and held
 * while the carrier moves across [lowGHz, highGHz]; k changes, so the beam moves (sin θ scales as f0/f).
 */
export function beamSquint(design: Design, beam: Beam, band: { lowGHz: number; highGHz: number; points: number }, offsets?: OffsetArrays): SquintResult {
  if (!(band.highGHz > band.lowGHz) || band.points < 2) throw new RangeError('invalid band');
  const { codes, phaseRad } = beamPhases(design, beam, offsets);
  const amplitude = channelAmplitude(offsets, channelCount(design.grouping, design.nx, design.ny));
  const intended = directionOf(beam.azDeg * RAD_PER_DEG, beam.elDeg * RAD_PER_DEG);
  const at = (frequencyGHz: number) => {
    const model = benchModel({ ...design, frequencyGHz }, phaseRad, amplitude);
    const peak = findPeak(model, intended);
    const towards = patternPower(model, beam.azDeg * RAD_PER_DEG, beam.elDeg * RAD_PER_DEG);
    return {
      peak,
      gainTowardDbi: towards > 0 ? directivityDbi(model, design.element, towards) : -Infinity,
      peakDirectivityDbi: directivityDbi(model, design.element, peak.power),
    };
  };
  const centre = at(design.frequencyGHz);
  const centreDir = directionOf(centre.peak.azRad, centre.peak.elRad);
  const points: SquintPoint[] = [];
  for (let i = 0; i < band.points; i++) {
    const f = band.lowGHz + ((band.highGHz - band.lowGHz) * i) / (band.points - 1);
    const r = at(f);
    const dir = directionOf(r.peak.azRad, r.peak.elRad);
    points.push({
      frequencyGHz: f,
      peakAzDeg: r.peak.azRad * DEG_PER_RAD,
      peakElDeg: r.peak.elRad * DEG_PER_RAD,
      squintDeg: angleBetweenRad(dir, centreDir) * DEG_PER_RAD,
      pointingErrorDeg: angleBetweenRad(dir, intended) * DEG_PER_RAD,
      gainTowardDbi: r.gainTowardDbi,
      peakDirectivityDbi: r.peakDirectivityDbi,
    });
  }
  const worst = points.reduce((a, b) => (b.squintDeg > a.squintDeg ? b : a));
  const minGain = Math.min(...points.map((p) => p.gainTowardDbi));
  return {
    beam,
    designFrequencyGHz: design.frequencyGHz,
    codes,
    points,
    worstSquintDeg: worst.squintDeg,
    worstSquintAtGHz: worst.frequencyGHz,
    worstGainDropDb: Math.max(0, centre.gainTowardDbi - minGain),
  };
}
