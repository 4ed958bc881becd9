/**
 * Part of the trade store: designs of the open sweep, paged from the server for the grid and loaded in full (up to
 * a cap) for the charts and the ranking, in the grid's sort and filters and over the sheet's scan window (a device
 * sweep's rows are its variants' coverage).
 */
import { ref, shallowRef, type Ref } from 'vue';
import { sweepsApi } from '@/api/sweeps';
import { scanWindowParams, type ViewQuery } from '@/api/results-query';
import type { Page } from '@shared/api/sweeps.ts';
import type { DeviceSweepAbout } from '@shared/devices/device-sweep-spec.ts';
import type { SweepCostBasis } from '@shared/cost/cost-model.ts';
import { MAX_PAGE_ROWS } from '@shared/sweep/results-query.ts';
import type { TargetSheet } from '@shared/targets/sheet.ts';
import { fromDesignRow, type DesignRowJson, type SteerSpan, type TradeDesign } from '@shared/trade/trade-design.ts';

/** Rows loaded for charts and ranking; beyond this the charts say they show the first rows of the current order. */
export const CHART_ROW_CAP = 20_000;
/** Rows per request when loading more than one page (the server's page limit). */
const BULK_PAGE = MAX_PAGE_ROWS;

export function useDesignRows(
  sweepId: Ref<string | null>,
  sheet: Ref<TargetSheet | null>,
  span: Ref<SteerSpan | null>,
  fail: (e: unknown) => void,
  device: Readonly<Ref<DeviceSweepAbout | null>>,
) {
  const rows = shallowRef<TradeDesign[]>([]);
  const rowsTotal = ref(0);
  const view = ref<ViewQuery>({ sort: [], ranges: {} });
  /** Which cost model priced the open sweep's cost figures (the designs endpoint says). */
  const costBasis = ref<SweepCostBasis | null>(null);

  /** One page of designs in the grid's current sort and filter, with figures over the sheet's scan range. */
  async function fetchPage(q: ViewQuery, offset: number, limit: number): Promise<Page<TradeDesign>> {
    if (!sweepId.value) return { rows: [], total: 0 };
    // A device sweep's coverage has no steering to window.
    const region = device.value?.region ?? null;
    const page = await sweepsApi.designs(sweepId.value, q, offset, limit, region ? {} : scanWindowParams(sheet.value));
    costBasis.value = page.cost;
    return { rows: page.rows.map((r) => fromDesignRow(r as DesignRowJson, span.value, region)), total: page.total };
  }

  /** Every row of a view, up to `cap`, in pages. */
  async function fetchAll(q: ViewQuery, cap: number): Promise<Page<TradeDesign>> {
    const first = await fetchPage(q, 0, Math.min(BULK_PAGE, cap));
    const out = [...first.rows];
    while (out.length < Math.min(first.total, cap)) {
      const next = await fetchPage(q, out.length, Math.min(BULK_PAGE, cap - out.length));
      if (next.rows.length === 0) break;
      out.push(...next.rows);
    }
    return { rows: out, total: first.total };
  }

  /** Rows for charts and ranking follow the grid's filters, so the charts show what the table shows. */
  async function loadChartRows(): Promise<void> {
    try {
      const all = await fetchAll(view.value, CHART_ROW_CAP);
      rows.value = all.rows;
      rowsTotal.value = all.total;
    } catch (e) {
      fail(e);
    }
  }

  async function setView(q: ViewQuery): Promise<void> {
    if (JSON.stringify(q) === JSON.stringify(view.value)) return;
    view.value = q;
    await loadChartRows();
  }

  return { rows, rowsTotal, view, costBasis, fetchPage, fetchAll, loadChartRows, setView };
}
