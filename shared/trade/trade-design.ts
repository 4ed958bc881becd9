/**
 * One row of the trade table: a design (its parameters, without the steering that varies across its points) and
 * its worst-case figures over its points. The server's designs endpoint and the client-side fallback both map here.
 */
import type { Region } from '../schemas/coverage.ts';
import type { DesignFigures } from '../targets/figures.ts';
import { deviceFigures } from '../devices/device-figures.ts';

export interface TaperLike {
  kind: string;
  sllDb?: number;
  nbar?: number;
}
export interface ElementLike {
  kind: string;
  q?: number;
}

/** The design parameters the trade table shows (a resolved engine design, steering left out). */
export interface TradeParams {
  frequencyGHz: number;
  nx: number;
  ny: number;
  dxMm: number;
  dyMm: number;
  taperX: TaperLike;
  taperY: TaperLike;
  phaseBits: number | null;
  grouping: string;
  element: ElementLike;
  channelPowerDbm: number | null;
}

export interface TradeDesign {
  designIndex: number;
  params: TradeParams;
  figures: DesignFigures;
  /** Scan angle where a grating lobe first enters visible space, per axis (degrees; null for a one-element axis). */
  gratingLobeOnsetAzDeg: number | null;
  gratingLobeOnsetElDeg: number | null;
  /** Largest scan angle from broadside among the design's points (degrees). */
  scanRangeDeg: number | null;
  directivityMaxDbi: number | null;
  points: number;
  failedPoints: number;
  /** Total conducted power of the design (dBm), and its chips under the study's cost model; absent = unknown. */
  conductedPowerDbm?: number | null;
  beamformerChips?: number | null;
  /** Gain worst cases over the design's steers (dBi, dB); absent or null for sweeps stored before they existed. */
  gainMaxDbi?: number | null;
  gainAtSteerMinDbi?: number | null;
  pointingLossMaxDb?: number | null;
  /** A device sweep's variant: its EIRP at the 50th percentile (dBm, over its region) and beams of every codebook. */
  p50EirpDbm?: number | null;
  beams?: number | null;
}

/** Short words for a taper, as the table and the chart legends print it. */
export function taperLabel(t: TaperLike | null | undefined): string {
  if (!t) return '';
  switch (t.kind) {
    case 'taylor':
      return `Taylor ${t.sllDb ?? '?'} dB n̄${t.nbar ?? '?'}`;
    case 'chebyshev':
      return `Dolph-Chebyshev ${t.sllDb ?? '?'} dB`;
    case 'uniform':
      return 'uniform';
    case 'hann':
      return 'Hann';
    case 'hamming':
      return 'Hamming';
    default:
      return t.kind;
  }
}

export function elementLabel(e: ElementLike | null | undefined): string {
  if (!e) return '';
  if (e.kind === 'cosine') return `cosine q=${e.q ?? '?'}`;
  if (e.kind === 'tr38901') return 'TR 38.901';
  return e.kind;
}

/** Speed of light over 1e3 (mm·GHz), so pitch/λ = pitchMm · f / C_MM_GHZ. */
const C_MM_GHZ = 299.792458;

export function pitchInWavelengths(pitchMm: number, frequencyGHz: number): number {
  return (pitchMm * frequencyGHz) / C_MM_GHZ;
}

/** One row of GET /api/sweeps/:id/designs (camelCase of the sweep_designs columns; see shared/sweep/columns.ts). */
export interface DesignRowJson {
  designIndex: number;
  design: Partial<TradeParams> & Record<string, unknown>;
  angles?: number | null;
  pointsFailed?: number | null;
  [figure: string]: unknown;
}

/** The steering a sweep lists (the same for every design of a sweep, since the grid is a product). */
export interface SteerSpan {
  azMinDeg: number;
  azMaxDeg: number;
  elMinDeg: number;
  elMaxDeg: number;
}

const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/**
 * Maps a designs-endpoint row to a trade row; without a span the scan-coverage checks are not applicable. A device
 * sweep's row (`region`: the region its coverage covers) has the device's figures only, as its coverage judged them.
 */
export function fromDesignRow(row: DesignRowJson, span: SteerSpan | null, region: Region | null = null): TradeDesign {
  const d = row.design ?? {};
  const dx = num(d.dxMm) ?? num(row.dxMm) ?? 0;
  const params: TradeParams = {
    frequencyGHz: num(d.frequencyGHz) ?? num(row.frequencyGHz) ?? 0,
    nx: num(d.nx) ?? num(row.nx) ?? 1,
    ny: num(d.ny) ?? num(row.ny) ?? 1,
    dxMm: dx,
    dyMm: num(d.dyMm) ?? num(row.dyMm) ?? dx,
    taperX: (d.taperX as TaperLike | undefined) ?? { kind: 'uniform' },
    taperY: (d.taperY as TaperLike | undefined) ?? { kind: 'uniform' },
    phaseBits: num(d.phaseBits ?? row.phaseBits),
    grouping: String(d.grouping ?? row.grouping ?? 'element'),
    element: (d.element as ElementLike | undefined) ?? { kind: 'isotropic' },
    channelPowerDbm: num(d.channelPowerDbm ?? row.channelPowerDbm),
  };
  const figures: DesignFigures = {
    apertureXMm: num(row.apertureXMm),
    apertureYMm: num(row.apertureYMm),
    channels: num(row.channels),
    peakEirpDbm: num(row.peakEirpDbm),
    edgeEirpDbm: num(row.edgeEirpDbm),
    scanLossEdgeDb: num(row.scanLossEdgeDb),
    hpbwAzMinDeg: num(row.hpbwAzMinDeg),
    hpbwAzMaxDeg: num(row.hpbwAzMaxDeg),
    hpbwElMinDeg: num(row.hpbwElMinDeg),
    hpbwElMaxDeg: num(row.hpbwElMaxDeg),
    worstSllDb: num(row.worstSllDb),
    gratingLobeInScan: typeof row.gratingLobeVisibleAny === 'boolean' ? row.gratingLobeVisibleAny : null,
    maxPointingErrorDeg: num(row.maxPointingErrorDeg),
    scanAzMinDeg: span?.azMinDeg ?? null,
    scanAzMaxDeg: span?.azMaxDeg ?? null,
    scanElMinDeg: span?.elMinDeg ?? null,
    scanElMaxDeg: span?.elMaxDeg ?? null,
    costUsd: num(row.costUsd),
    dcPowerW: num(row.dcPowerW),
    heatWPerCm2: num(row.heatWPerCm2),
  };
  const coverage = region
    ? deviceFigures({ region, peakEirpDbm: num(row.peakEirpDbm), minEirpDbm: num(row.sectorMinEirpDbm), eirpPercentilesDbm: { '50': num(row.p50EirpDbm) } })
    : null;
  return {
    designIndex: row.designIndex,
    params,
    figures: coverage ?? figures,
    gratingLobeOnsetAzDeg: num(row.gratingLobeOnsetAzDeg),
    gratingLobeOnsetElDeg: num(row.gratingLobeOnsetElDeg),
    scanRangeDeg: num(row.scanRangeDeg),
    directivityMaxDbi: num(row.directivityMaxDbi),
    points: num(row.angles) ?? 0,
    failedPoints: num(row.pointsFailed) ?? 0,
    conductedPowerDbm: num(row.conductedPowerDbm),
    beamformerChips: num(row.beamformerChips),
    gainMaxDbi: num(row.gainMaxDbi),
    gainAtSteerMinDbi: num(row.gainAtSteerMinDbi),
    pointingLossMaxDb: num(row.pointingLossMaxDb),
    ...(region ? { p50EirpDbm: num(row.p50EirpDbm), beams: num(row.beams) } : {}),
  };
}
