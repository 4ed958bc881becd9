/**
 * AG Grid's sort and filter models as query parameters of the sweeps results API, and back to nothing else:
 * the server does the sorting and filtering so a 100,000-row sweep pages quickly.
 */
import type { SortModelItem } from 'ag-grid-community';
import { serverKeyOf, tradeField } from '@shared/trade/trade-fields.ts';
import { DESIGN_COL_ID } from './trade-columns';
import type { ViewQuery } from '@/api/results-query';

export { queryString, scanWindowLabel, scanWindowParams, type ViewQuery } from '@/api/results-query';

/** One number filter as AG Grid's agNumberColumnFilter reports it. */
interface NumberFilterModel {
  filterType?: string;
  type?: string;
  filter?: number | null;
  filterTo?: number | null;
}

function serverKey(colId: string): string | null {
  if (colId === DESIGN_COL_ID) return 'designIndex';
  const f = tradeField(colId);
  return f ? serverKeyOf(f) : null;
}

export function viewQuery(sortModel: SortModelItem[], filterModel: Record<string, NumberFilterModel> | null | undefined): ViewQuery {
  const sort = sortModel.flatMap((s) => {
    const key = serverKey(s.colId);
    return key ? [{ key, dir: s.sort }] : [];
  });
  const ranges: ViewQuery['ranges'] = {};
  for (const [colId, m] of Object.entries(filterModel ?? {})) {
    const key = serverKey(colId);
    if (!key || m.filter === null || m.filter === undefined) continue;
    if (m.type === 'inRange') ranges[key] = { min: m.filter, ...(m.filterTo != null ? { max: m.filterTo } : {}) };
    else if (m.type === 'greaterThanOrEqual' || m.type === 'greaterThan') ranges[key] = { min: m.filter };
    else if (m.type === 'lessThanOrEqual' || m.type === 'lessThan') ranges[key] = { max: m.filter };
    else if (m.type === 'equals') ranges[key] = { min: m.filter, max: m.filter };
  }
  return { sort, ranges };
}

