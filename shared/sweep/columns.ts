/**
 * Stored columns of sweep results, named once: the API field (camelCase), the SQL column and its kind.
 * The results API sorts and filters only on these, and the CSV export writes them in this order.
 */
import type { Design } from '../schemas/design.ts';

export type ColumnKind = 'float' | 'int' | 'bool' | 'text';

export interface ColumnDef {
  field: string;
  column: string;
  kind: ColumnKind;
}

const col = (field: string, column: string, kind: ColumnKind): ColumnDef => ({ field, column, kind });

/** Design parameters, without steering. Tapers and elements are stored as short labels (`taylor(25,4)`). */
export const DESIGN_PARAM_COLUMNS: ColumnDef[] = [
  col('frequencyGHz', 'frequency_ghz', 'float'),
  col('nx', 'nx', 'int'),
  col('ny', 'ny', 'int'),
  col('dxMm', 'dx_mm', 'float'),
  col('dyMm', 'dy_mm', 'float'),
  col('taperX', 'taper_x', 'text'),
  col('taperY', 'taper_y', 'text'),
  col('phaseBits', 'phase_bits', 'int'),
  col('grouping', 'grouping', 'text'),
  col('element', 'element', 'text'),
  col('channelPowerDbm', 'channel_power_dbm', 'float'),
  col('attenuatorStepDb', 'attenuator_step_db', 'float'),
  col('attenuatorBits', 'attenuator_bits', 'int'),
];

export const STEER_COLUMNS: ColumnDef[] = [col('steerAzDeg', 'steer_az_deg', 'float'), col('steerElDeg', 'steer_el_deg', 'float')];

/** Every scalar metric of the engine contract (codes and warnings live in the metrics JSON only). */
export const METRIC_COLUMNS: ColumnDef[] = [
  col('peakAzDeg', 'peak_az_deg', 'float'),
  col('peakElDeg', 'peak_el_deg', 'float'),
  col('pointingErrorDeg', 'pointing_error_deg', 'float'),
  col('hpbwAzDeg', 'hpbw_az_deg', 'float'),
  col('hpbwElDeg', 'hpbw_el_deg', 'float'),
  col('hpbwAzClipped', 'hpbw_az_clipped', 'bool'),
  col('hpbwElClipped', 'hpbw_el_clipped', 'bool'),
  col('sllAzDb', 'sll_az_db', 'float'),
  col('sllElDb', 'sll_el_db', 'float'),
  col('peakSllDb', 'peak_sll_db', 'float'),
  col('directivityDbi', 'directivity_dbi', 'float'),
  col('scanLossDb', 'scan_loss_db', 'float'),
  col('taperEfficiencyDb', 'taper_efficiency_db', 'float'),
  col('gratingLobeOnsetAzDeg', 'grating_lobe_onset_az_deg', 'float'),
  col('gratingLobeOnsetElDeg', 'grating_lobe_onset_el_deg', 'float'),
  col('gratingLobeVisible', 'grating_lobe_visible', 'bool'),
  col('channels', 'channels', 'int'),
  col('apertureXMm', 'aperture_x_mm', 'float'),
  col('apertureYMm', 'aperture_y_mm', 'float'),
  col('eirpDbm', 'eirp_dbm', 'float'),
  col('elementGainDbi', 'element_gain_dbi', 'float'),
  col('gainDbi', 'gain_dbi', 'float'),
  col('gainAtSteerDbi', 'gain_at_steer_dbi', 'float'),
  col('pointingLossDb', 'pointing_loss_db', 'float'),
  col('conductedPowerDbm', 'conducted_power_dbm', 'float'),
  col('eirpAtSteerDbm', 'eirp_at_steer_dbm', 'float'),
];

export const POINT_COLUMNS: ColumnDef[] = [
  col('index', 'point_index', 'int'),
  col('designIndex', 'design_index', 'int'),
  col('angleIndex', 'angle_index', 'int'),
  ...DESIGN_PARAM_COLUMNS,
  ...STEER_COLUMNS,
  ...METRIC_COLUMNS,
];

/** Worst cases over a design's steering angles: what the trade table shows per row. */
export const DESIGN_SUMMARY_COLUMNS: ColumnDef[] = [
  col('angles', 'angles', 'int'),
  col('pointsFailed', 'points_failed', 'int'),
  col('scanRangeDeg', 'scan_range_deg', 'float'),
  col('scanLossEdgeDb', 'scan_loss_edge_db', 'float'),
  col('scanLossMaxDb', 'scan_loss_max_db', 'float'),
  col('hpbwAzMaxDeg', 'hpbw_az_max_deg', 'float'),
  col('hpbwAzMinDeg', 'hpbw_az_min_deg', 'float'),
  col('hpbwElMaxDeg', 'hpbw_el_max_deg', 'float'),
  col('hpbwElMinDeg', 'hpbw_el_min_deg', 'float'),
  col('worstSllDb', 'worst_sll_db', 'float'),
  col('directivityMaxDbi', 'directivity_max_dbi', 'float'),
  col('gratingLobeOnsetAzDeg', 'grating_lobe_onset_az_deg', 'float'),
  col('gratingLobeOnsetElDeg', 'grating_lobe_onset_el_deg', 'float'),
  col('gratingLobeVisibleAny', 'grating_lobe_visible_any', 'bool'),
  col('peakEirpDbm', 'peak_eirp_dbm', 'float'),
  col('minEirpDbm', 'min_eirp_dbm', 'float'),
  col('edgeEirpDbm', 'edge_eirp_dbm', 'float'),
  col('apertureXMm', 'aperture_x_mm', 'float'),
  col('apertureYMm', 'aperture_y_mm', 'float'),
  col('channels', 'channels', 'int'),
  col('maxPointingErrorDeg', 'max_pointing_error_deg', 'float'),
  col('gainMaxDbi', 'gain_max_dbi', 'float'),
  col('gainAtSteerMinDbi', 'gain_at_steer_min_dbi', 'float'),
  col('pointingLossMaxDb', 'pointing_loss_max_db', 'float'),
  col('minEirpAtSteerDbm', 'min_eirp_at_steer_dbm', 'float'),
];

/**
 * Cost and power of a design (shared/sweep/design-cost.ts): the conducted power it is priced from, then the figures
 * under the study's current cost model (re-priced whenever the model is saved; sweeps.cost_model_version says which).
 * They do not depend on steering, so a scan window leaves them as stored.
 */
export const DESIGN_COST_COLUMNS: ColumnDef[] = [
  col('conductedPowerDbm', 'conducted_power_dbm', 'float'),
  col('beamformerChips', 'beamformer_chips', 'int'),
  col('costUsd', 'cost_usd', 'float'),
  col('dcPowerW', 'dc_power_w', 'float'),
  col('heatWPerCm2', 'heat_w_per_cm2', 'float'),
];

/**
 * Coverage of a device sweep's variant (shared/devices/device-sweep.ts, DeviceSweepRow): the 50th-percentile EIRP,
 * the lowest EIRP across the sheet's sector (null over the sphere) and the beams of every codebook. Its peak EIRP is
 * the summary's peakEirpDbm. Null on the rows of a grid sweep.
 */
export const DESIGN_COVERAGE_COLUMNS: ColumnDef[] = [
  col('p50EirpDbm', 'p50_eirp_dbm', 'float'),
  col('sectorMinEirpDbm', 'sector_min_eirp_dbm', 'float'),
  col('beams', 'beams', 'int'),
];

export const DESIGN_COLUMNS: ColumnDef[] = [
  col('designIndex', 'design_index', 'int'),
  ...DESIGN_PARAM_COLUMNS,
  ...DESIGN_SUMMARY_COLUMNS,
  ...DESIGN_COST_COLUMNS,
  ...DESIGN_COVERAGE_COLUMNS,
];

type Labelled = { kind: string } & Record<string, unknown>;

/** `uniform`, `taylor(25,4)`, `chebyshev(30)`, `cosine(1.5)`: sortable and filterable as text. */
export function kindLabel(v: Labelled): string {
  const args = Object.entries(v)
    // A table element's resolved values stay out of the label (its patternId names it).
    .filter(([k, x]) => k !== 'kind' && k !== 'pattern' && x !== undefined)
    .map(([k, x]) => (k === 'gainDbi' ? `${String(x)}dBi` : String(x)));
  return args.length === 0 ? v.kind : `${v.kind}(${args.join(',')})`;
}

/** The stored value of a design parameter column. */
export function paramValue(design: Design, field: string): unknown {
  const v = (design as Record<string, unknown>)[field];
  if (v !== null && typeof v === 'object' && 'kind' in v) return kindLabel(v as Labelled);
  return v ?? null;
}
