/**
 * Column definitions of the trade table, built from the shared field catalogue. Pure: no grid, no DOM, so the
 * component test can check headers, groups, pinning and pass/fail classes directly.
 */
import type { CellClassParams, ColDef, ColGroupDef, ValueFormatterParams, ValueGetterParams } from 'ag-grid-community';
import type { TargetSheet } from '@shared/targets/sheet.ts';
import { LIMIT_LABELS } from '@shared/targets/sheet.ts';
import { fieldVerdict, rowVerdict } from '@shared/trade/judge.ts';
import { designFailLines } from '@shared/trade/fail-reasons.ts';
import type { TradeDesign } from '@shared/trade/trade-design.ts';
import { fieldTitle, formatValue, serverKeyOf, tradeFieldsFor, type FieldGroup, type TradeField } from '@shared/trade/trade-fields.ts';

export const STATUS_COL_ID = 'status';
export const DESIGN_COL_ID = 'designIndex';

/** Number filters the server can answer: a range or one bound. */
const NUMBER_FILTER_PARAMS = {
  filterOptions: ['inRange', 'greaterThanOrEqual', 'lessThanOrEqual', 'equals'],
  maxNumConditions: 1,
  buttons: ['apply', 'reset'],
  closeOnApply: true,
};

export interface TradeColumnOptions {
  sheet: TargetSheet | null;
  /** A sweep over a device: the parameters it varies, shown with its coverage columns instead of the metrics. */
  deviceVaried?: readonly string[] | null;
}

function fieldColumn(field: TradeField, opts: TradeColumnOptions): ColDef<TradeDesign> {
  // Sorting and filtering happen on the server, so only fields it stores are sortable or filterable.
  const server = serverKeyOf(field) !== null;
  const col: ColDef<TradeDesign> = {
    colId: field.key,
    headerName: fieldTitle(field),
    headerTooltip: field.limit && opts.sheet ? `Judged by the target sheet: ${LIMIT_LABELS[field.limit]}` : fieldTitle(field),
    valueGetter: (p: ValueGetterParams<TradeDesign>) => (p.data ? field.get(p.data) : null),
    valueFormatter: (p: ValueFormatterParams<TradeDesign>) => (p.data ? formatValue(field, p.value) : ''),
    sortable: server,
    filter: server && field.type === 'number' ? 'agNumberColumnFilter' : false,
    filterParams: field.type === 'number' ? NUMBER_FILTER_PARAMS : undefined,
    // Numbers sit right in their cells; the header stays left-aligned so its filter icon follows its own label.
    cellClass: field.type === 'number' ? 'ag-right-aligned-cell' : undefined,
    minWidth: 90,
  };
  if (field.limit) {
    col.cellClassRules = {
      'cell-pass': (p: CellClassParams<TradeDesign>) => !!p.data && fieldVerdict(field, p.data, opts.sheet) === 'pass',
      'cell-fail': (p: CellClassParams<TradeDesign>) => !!p.data && fieldVerdict(field, p.data, opts.sheet) === 'fail',
    };
  }
  return col;
}

/** Status (pinned), design number (pinned), then the "Parameters" and "Metrics" (or, over a device, "Coverage") groups. */
export function tradeColumns(opts: TradeColumnOptions): (ColDef<TradeDesign> | ColGroupDef<TradeDesign>)[] {
  const status: ColDef<TradeDesign> = {
    colId: STATUS_COL_ID,
    headerName: 'Target sheet',
    headerTooltip: opts.sheet ? 'Pass when every limit of the target sheet is met' : 'The study has no target sheet yet',
    pinned: 'left',
    lockPinned: true,
    width: 120,
    sortable: false,
    filter: false,
    valueGetter: (p: ValueGetterParams<TradeDesign>) => (p.data ? rowVerdict(p.data, opts.sheet) : null),
    valueFormatter: (p: ValueFormatterParams<TradeDesign>) =>
      p.value === 'pass' ? '✓ pass' : p.value === 'fail' ? '✗ fail' : p.value === 'n/a' ? 'no sheet' : '',
    // Hovering a fail names each failed limit with its margin.
    tooltip: (p) => (p.data && p.value === 'fail' ? designFailLines(p.data, opts.sheet).join('\n') : null),
    cellClassRules: {
      'row-pass': (p: CellClassParams<TradeDesign>) => p.value === 'pass',
      'row-fail': (p: CellClassParams<TradeDesign>) => p.value === 'fail',
    },
  };
  const design: ColDef<TradeDesign> = {
    colId: DESIGN_COL_ID,
    headerName: 'Design #',
    pinned: 'left',
    width: 110,
    sortable: true,
    filter: 'agNumberColumnFilter',
    filterParams: NUMBER_FILTER_PARAMS,
    valueGetter: (p: ValueGetterParams<TradeDesign>) => p.data?.designIndex ?? null,
  };
  // The server sorts by one field at a time; a shift-click multi-sort would silently use only the first.
  const fields = tradeFieldsFor(opts.deviceVaried ?? null);
  const group = (name: FieldGroup): ColGroupDef<TradeDesign> => ({
    groupId: name.toLowerCase(),
    headerName: name,
    children: fields.filter((x) => x.group === name).map((x) => fieldColumn(x, opts)),
  });
  return [status, design, group('Parameters'), group(opts.deviceVaried ? 'Coverage' : 'Metrics')];
}

/** Every leaf column in display order (for export headers). */
export function leafColumns(cols: (ColDef<TradeDesign> | ColGroupDef<TradeDesign>)[]): ColDef<TradeDesign>[] {
  return cols.flatMap((c) => ('children' in c ? leafColumns(c.children as ColDef<TradeDesign>[]) : [c as ColDef<TradeDesign>]));
}
