/**
 * The catalogue of what a trade row can show: every parameter and figure with its label, unit, how to read it,
 * which target-sheet limit judges it and which way is better. The trade table's columns, the scatter's axis
 * pickers, the heat map and the ranking all read this one list, so a label or unit is written once.
 */
import type { LimitKey } from '../targets/sheet.ts';
import { elementLabel, pitchInWavelengths, taperLabel, type TradeDesign } from './trade-design.ts';

export type FieldGroup = 'Parameters' | 'Metrics' | 'Coverage';
export type FieldType = 'number' | 'text' | 'boolean';

export interface TradeField {
  /** Stable id; also the sort/filter key sent to the server. */
  key: string;
  label: string;
  unit: string;
  group: FieldGroup;
  type: FieldType;
  get: (row: TradeDesign) => number | string | boolean | null;
  /** Decimal places when printed. */
  digits?: number;
  /** The target-sheet limit that judges this figure. */
  limit?: LimitKey;
  /** Which way is better, when the field makes sense as an objective. */
  better?: 'min' | 'max';
  /** Sort/filter key on the server when it differs from `key`; null when the server cannot sort by it. */
  serverKey?: string | null;
}

/** The key to send to the server for sorting or filtering, or null when only the client knows the field. */
export function serverKeyOf(field: TradeField): string | null {
  return field.serverKey === undefined ? field.key : field.serverKey;
}

const f = (row: TradeDesign) => row.figures;

export const TRADE_FIELDS: readonly TradeField[] = [
  { key: 'frequencyGHz', label: 'Frequency', unit: 'GHz', group: 'Parameters', type: 'number', digits: 2, get: (r) => r.params.frequencyGHz },
  { key: 'nx', label: 'nx', unit: '', group: 'Parameters', type: 'number', digits: 0, get: (r) => r.params.nx },
  { key: 'ny', label: 'ny', unit: '', group: 'Parameters', type: 'number', digits: 0, get: (r) => r.params.ny },
  { key: 'dxMm', label: 'Pitch x', unit: 'mm', group: 'Parameters', type: 'number', digits: 2, get: (r) => r.params.dxMm },
  { key: 'dyMm', label: 'Pitch y', unit: 'mm', group: 'Parameters', type: 'number', digits: 2, get: (r) => r.params.dyMm },
  {
    key: 'dxLambda', label: 'Pitch x', unit: 'λ', group: 'Parameters', type: 'number', digits: 3, serverKey: null,
    get: (r) => pitchInWavelengths(r.params.dxMm, r.params.frequencyGHz),
  },
  { key: 'taperX', label: 'Taper x', unit: '', group: 'Parameters', type: 'text', get: (r) => taperLabel(r.params.taperX) },
  { key: 'taperY', label: 'Taper y', unit: '', group: 'Parameters', type: 'text', get: (r) => taperLabel(r.params.taperY) },
  { key: 'phaseBits', label: 'Phase bits', unit: '', group: 'Parameters', type: 'number', digits: 0, get: (r) => r.params.phaseBits },
  { key: 'grouping', label: 'Grouping', unit: '', group: 'Parameters', type: 'text', get: (r) => r.params.grouping },
  { key: 'element', label: 'Element', unit: '', group: 'Parameters', type: 'text', get: (r) => elementLabel(r.params.element) },
  { key: 'channelPowerDbm', label: 'Channel power', unit: 'dBm', group: 'Parameters', type: 'number', digits: 1, get: (r) => r.params.channelPowerDbm },

  { key: 'channels', label: 'Channels', unit: '', group: 'Metrics', type: 'number', digits: 0, limit: 'maxChannels', better: 'min', get: (r) => f(r).channels },
  { key: 'apertureXMm', label: 'Aperture x', unit: 'mm', group: 'Metrics', type: 'number', digits: 1, limit: 'maxApertureXMm', better: 'min', get: (r) => f(r).apertureXMm },
  { key: 'apertureYMm', label: 'Aperture y', unit: 'mm', group: 'Metrics', type: 'number', digits: 1, limit: 'maxApertureYMm', better: 'min', get: (r) => f(r).apertureYMm },
  { key: 'peakEirpDbm', label: 'Peak EIRP', unit: 'dBm', group: 'Metrics', type: 'number', digits: 1, limit: 'minPeakEirpDbm', better: 'max', get: (r) => f(r).peakEirpDbm },
  { key: 'edgeEirpDbm', label: 'EIRP at edge of scan', unit: 'dBm', group: 'Metrics', type: 'number', digits: 1, limit: 'minEdgeEirpDbm', better: 'max', get: (r) => f(r).edgeEirpDbm },
  { key: 'scanLossEdgeDb', label: 'Scan loss at edge', unit: 'dB', group: 'Metrics', type: 'number', digits: 2, limit: 'maxScanLossDb', better: 'min', get: (r) => f(r).scanLossEdgeDb },
  { key: 'hpbwAzMaxDeg', label: 'Widest HPBW az', unit: '°', group: 'Metrics', type: 'number', digits: 1, limit: 'hpbwAzDeg', better: 'min', get: (r) => f(r).hpbwAzMaxDeg },
  { key: 'hpbwAzMinDeg', label: 'Narrowest HPBW az', unit: '°', group: 'Metrics', type: 'number', digits: 1, limit: 'hpbwAzDeg', get: (r) => f(r).hpbwAzMinDeg },
  { key: 'hpbwElMaxDeg', label: 'Widest HPBW el', unit: '°', group: 'Metrics', type: 'number', digits: 1, limit: 'hpbwElDeg', better: 'min', get: (r) => f(r).hpbwElMaxDeg },
  { key: 'hpbwElMinDeg', label: 'Narrowest HPBW el', unit: '°', group: 'Metrics', type: 'number', digits: 1, limit: 'hpbwElDeg', get: (r) => f(r).hpbwElMinDeg },
  { key: 'worstSllDb', label: 'Worst side-lobe level', unit: 'dB', group: 'Metrics', type: 'number', digits: 1, limit: 'maxSllDb', better: 'min', get: (r) => f(r).worstSllDb },
  { key: 'scanRangeDeg', label: 'Scan range', unit: '°', group: 'Metrics', type: 'number', digits: 1, better: 'max', get: (r) => r.scanRangeDeg },
  // Gain counts the embedded element and the taper as a link budget does; directivity is the pattern's own figure.
  // (EIRP at edge of scan above is the EIRP toward the steer there, since engine 1.1.0.)
  { key: 'gainMaxDbi', label: 'Peak gain', unit: 'dBi', group: 'Metrics', type: 'number', digits: 1, better: 'max', get: (r) => r.gainMaxDbi ?? null },
  { key: 'gainAtSteerMinDbi', label: 'Lowest gain toward the steer', unit: 'dBi', group: 'Metrics', type: 'number', digits: 1, better: 'max', get: (r) => r.gainAtSteerMinDbi ?? null },
  { key: 'pointingLossMaxDb', label: 'Worst pointing loss', unit: 'dB', group: 'Metrics', type: 'number', digits: 2, better: 'min', get: (r) => r.pointingLossMaxDb ?? null },
  { key: 'directivityMaxDbi', label: "Peak directivity (the pattern's)", unit: 'dBi', group: 'Metrics', type: 'number', digits: 1, better: 'max', get: (r) => r.directivityMaxDbi },
  { key: 'gratingLobeOnsetAzDeg', label: 'Grating-lobe onset az', unit: '°', group: 'Metrics', type: 'number', digits: 1, better: 'max', get: (r) => r.gratingLobeOnsetAzDeg },
  { key: 'gratingLobeOnsetElDeg', label: 'Grating-lobe onset el', unit: '°', group: 'Metrics', type: 'number', digits: 1, better: 'max', get: (r) => r.gratingLobeOnsetElDeg },
  { key: 'gratingLobeInScan', label: 'Grating lobe in scan', unit: '', group: 'Metrics', type: 'boolean', limit: 'noGratingLobeInScan', serverKey: 'gratingLobeVisibleAny', get: (r) => f(r).gratingLobeInScan },
  { key: 'maxPointingErrorDeg', label: 'Worst pointing error', unit: '°', group: 'Metrics', type: 'number', digits: 2, limit: 'maxPointingErrorDeg', better: 'min', get: (r) => f(r).maxPointingErrorDeg },
  // Cost and power under the study's cost model (shared/cost); the amount is in the model's currency.
  { key: 'conductedPowerDbm', label: 'Conducted power', unit: 'dBm', group: 'Metrics', type: 'number', digits: 1, get: (r) => r.conductedPowerDbm ?? null },
  { key: 'beamformerChips', label: 'Beamformer chips', unit: '', group: 'Metrics', type: 'number', digits: 0, better: 'min', get: (r) => r.beamformerChips ?? null },
  { key: 'costUsd', label: 'Module cost', unit: 'model currency', group: 'Metrics', type: 'number', digits: 2, limit: 'maxCostUsd', better: 'min', get: (r) => f(r).costUsd ?? null },
  { key: 'dcPowerW', label: 'DC power', unit: 'W', group: 'Metrics', type: 'number', digits: 2, limit: 'maxDcPowerW', better: 'min', get: (r) => f(r).dcPowerW ?? null },
  { key: 'heatWPerCm2', label: 'Heat density', unit: 'W/cm²', group: 'Metrics', type: 'number', digits: 3, limit: 'maxHeatWPerCm2', better: 'min', get: (r) => f(r).heatWPerCm2 ?? null },
];

/**
 * A device sweep's rows: each is a variant of one module, judged by the device's coverage (shared/devices, the sheet's
 * coverage limits) instead of one design's figures over its steering. Shown instead of the Metrics group.
 */
export const COVERAGE_FIELDS: readonly TradeField[] = [
  { key: 'peakEirpDbm', label: 'Peak EIRP', unit: 'dBm', group: 'Coverage', type: 'number', digits: 1, limit: 'minPeakEirpDbm', better: 'max', get: (r) => f(r).peakEirpDbm },
  { key: 'p50EirpDbm', label: 'EIRP at the 50th percentile', unit: 'dBm', group: 'Coverage', type: 'number', digits: 1, limit: 'minCoverageP50EirpDbm', better: 'max', get: (r) => r.p50EirpDbm ?? null },
  { key: 'sectorMinEirpDbm', label: 'Lowest EIRP across the sector', unit: 'dBm', group: 'Coverage', type: 'number', digits: 1, limit: 'minSectorEirpDbm', better: 'max', get: (r) => f(r).sectorMinEirpDbm ?? null },
  { key: 'beams', label: 'Beams (all codebooks)', unit: '', group: 'Coverage', type: 'number', digits: 0, better: 'min', get: (r) => r.beams ?? null },
];

/**
 * The fields a sweep's rows show: parameters and metrics; for a sweep over a device (`varied`: the parameters it
 * varies, the rest being the device's own) the varied parameters and the coverage figures.
 */
export function tradeFieldsFor(varied: readonly string[] | null): readonly TradeField[] {
  return varied ? [...TRADE_FIELDS.filter((x) => x.group === 'Parameters' && varied.includes(x.key)), ...COVERAGE_FIELDS] : TRADE_FIELDS;
}

/** Every field of either kind of sweep, once per key (peak EIRP is the same figure in both): lookups, URL keys. */
export const ALL_TRADE_FIELDS: readonly TradeField[] = [...TRADE_FIELDS, ...COVERAGE_FIELDS.filter((c) => !TRADE_FIELDS.some((t) => t.key === c.key))];

const BY_KEY = new Map(ALL_TRADE_FIELDS.map((x) => [x.key, x]));

export function tradeField(key: string): TradeField | undefined {
  return BY_KEY.get(key);
}

/** "Peak EIRP (dBm)": the label with its unit, for headers and axes. */
export function fieldTitle(field: TradeField): string {
  return field.unit ? `${field.label} (${field.unit})` : field.label;
}

/** Numeric fields only: what a chart axis or a heat-map cell can show. */
export const NUMERIC_FIELDS = TRADE_FIELDS.filter((x) => x.type === 'number');

export function numericValue(field: TradeField, row: TradeDesign): number | null {
  const v = field.get(row);
  return typeof v === 'number' && Number.isFinite(v) ? v : null;
}

export function formatValue(field: TradeField, value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'number') return Number.isFinite(value) ? value.toFixed(field.digits ?? 2) : '—';
  return String(value);
}
