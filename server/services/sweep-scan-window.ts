/**
 * Design rows recomputed over a steering window: the worst cases of shared/sweep/design-summary.ts, taken in SQL
 * over only the points of the sweep steered inside the window, joined to the stored design parameters.
 * Designs with no point inside the window have no row. The result is a CTE named `windowed` with the columns
 * of sweep_designs, so the usual WHERE and ORDER BY of sweep-query.ts apply to it unchanged.
 */
import { DESIGN_COST_COLUMNS, DESIGN_COVERAGE_COLUMNS, DESIGN_PARAM_COLUMNS, DESIGN_SUMMARY_COLUMNS } from '../../shared/sweep/columns.ts';
import type { ScanWindow } from '../../shared/sweep/results-query.ts';

/** Same tolerances as the summary and the candidate preview: 59.9999999° still counts as 60°. */
const EDGE_TOL_DEG = 1e-6;
const WINDOW_TOL_DEG = 1e-6;

// "ok" = the point has metrics (failed points are counted, not used); "edge" = largest ok scan angle in the window.
const OK = 'ok';
const AT_EDGE = `ok AND scan >= edge - ${EDGE_TOL_DEG}`;
const first = (col: string) => `(array_agg(${col} ORDER BY point_index) FILTER (WHERE ${OK}))[1]`;

/** One aggregate per summary column, mirroring summariseDesign field by field. */
const SUMMARY_SQL: Record<string, string> = {
  angles: 'count(*)::int',
  points_failed: '(count(*) FILTER (WHERE NOT ok))::int',
  scan_range_deg: `max(scan) FILTER (WHERE ${OK})`,
  scan_loss_edge_db: `max(scan_loss_db) FILTER (WHERE ${AT_EDGE})`,
  scan_loss_max_db: `max(scan_loss_db) FILTER (WHERE ${OK})`,
  hpbw_az_max_deg: `max(hpbw_az_deg) FILTER (WHERE ${OK})`,
  hpbw_az_min_deg: `min(hpbw_az_deg) FILTER (WHERE ${OK})`,
  hpbw_el_max_deg: `max(hpbw_el_deg) FILTER (WHERE ${OK})`,
  hpbw_el_min_deg: `min(hpbw_el_deg) FILTER (WHERE ${OK})`,
  worst_sll_db: `max(peak_sll_db) FILTER (WHERE ${OK})`,
  directivity_max_dbi: `max(directivity_dbi) FILTER (WHERE ${OK})`,
  grating_lobe_onset_az_deg: first('grating_lobe_onset_az_deg'),
  grating_lobe_onset_el_deg: first('grating_lobe_onset_el_deg'),
  grating_lobe_visible_any: `CASE WHEN bool_or(ok) THEN coalesce(bool_or(grating_lobe_visible) FILTER (WHERE ${OK}), false) END`,
  peak_eirp_dbm: `max(eirp_dbm) FILTER (WHERE ${OK})`,
  min_eirp_dbm: `min(eirp_dbm) FILTER (WHERE ${OK})`,
  edge_eirp_dbm: `min(coalesce(eirp_at_steer_dbm, eirp_dbm)) FILTER (WHERE ${AT_EDGE})`,
  aperture_x_mm: first('aperture_x_mm'),
  aperture_y_mm: first('aperture_y_mm'),
  channels: first('channels'),
  max_pointing_error_deg: `max(pointing_error_deg) FILTER (WHERE ${OK})`,
  gain_max_dbi: `max(gain_dbi) FILTER (WHERE ${OK})`,
  gain_at_steer_min_dbi: `min(gain_at_steer_dbi) FILTER (WHERE ${OK})`,
  pointing_loss_max_db: `max(pointing_loss_db) FILTER (WHERE ${OK})`,
  min_eirp_at_steer_dbm: `min(eirp_at_steer_dbm) FILTER (WHERE ${OK})`,
};

// A summary column added to columns.ts without an aggregate here would silently read as missing: fail at load.
const missing = DESIGN_SUMMARY_COLUMNS.filter((c) => !(c.column in SUMMARY_SQL)).map((c) => c.column);
if (missing.length > 0) throw new Error(`scan window has no aggregate for ${missing.join(', ')}`);

const POINT_METRICS = [
  'scan_loss_db', 'hpbw_az_deg', 'hpbw_el_deg', 'peak_sll_db', 'directivity_dbi', 'grating_lobe_onset_az_deg',
  'grating_lobe_onset_el_deg', 'grating_lobe_visible', 'eirp_dbm', 'aperture_x_mm', 'aperture_y_mm', 'channels',
  'pointing_error_deg', 'gain_dbi', 'gain_at_steer_dbi', 'pointing_loss_db', 'eirp_at_steer_dbm',
];

/**
 * The `WITH … windowed AS (…)` prefix for a sweep (its id must be `$1` of `params`); appends the window bounds
 * to `params`. A missing axis is not restricted; a missing steer reads as 0°, as in the summary.
 */
export function windowedDesignsCte(az: ScanWindow | null | undefined, el: ScanWindow | null | undefined, params: unknown[]): string {
  const bind = (v: number) => {
    params.push(v);
    return `$${params.length}::float8`;
  };
  const conds = ['sweep_id = $1'];
  const within = (col: string, w: ScanWindow | null | undefined) => {
    if (w) conds.push(`coalesce(${col}, 0) BETWEEN ${bind(w.min - WINDOW_TOL_DEG)} AND ${bind(w.max + WINDOW_TOL_DEG)}`);
  };
  within('steer_az_deg', az);
  within('steer_el_deg', el);
  const scan = 'degrees(acos(greatest(-1, least(1, cos(radians(coalesce(steer_az_deg, 0))) * cos(radians(coalesce(steer_el_deg, 0)))))))';
  return `WITH wp AS (
      SELECT design_index, point_index, (metrics IS NOT NULL AND jsonb_typeof(metrics) = 'object') AS ok, ${scan} AS scan,
        ${POINT_METRICS.join(', ')}
      FROM sweep_points WHERE ${conds.join(' AND ')}
    ), we AS (
      SELECT wp.*, max(scan) FILTER (WHERE ok) OVER (PARTITION BY design_index) AS edge FROM wp
    ), ws AS (
      SELECT design_index, ${DESIGN_SUMMARY_COLUMNS.map((c) => `${SUMMARY_SQL[c.column]} AS ${c.column}`).join(', ')}
      FROM we GROUP BY design_index
    ), windowed AS (
      SELECT d.sweep_id, d.design_index, ${DESIGN_PARAM_COLUMNS.map((c) => `d.${c.column}`).join(', ')}, d.design,
        ${DESIGN_SUMMARY_COLUMNS.map((c) => `ws.${c.column}`).join(', ')},
        ${[...DESIGN_COST_COLUMNS, ...DESIGN_COVERAGE_COLUMNS].map((c) => `d.${c.column}`).join(', ')}
      FROM sweep_designs d JOIN ws ON ws.design_index = d.design_index WHERE d.sweep_id = $1
    ) `;
}
