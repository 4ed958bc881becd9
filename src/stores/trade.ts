/**
 * The trade table's state for the open study: which sweep is shown, its rows (paged from the server for the grid,
 * loaded in full up to a cap for the charts and the ranking), the target sheet that judges them, and the designs
 * selected to compare (shared by the table and every chart).
 */
import { defineStore } from 'pinia';
import type { SweepCostBasis } from '@shared/cost/cost-model.ts';
import { computed, ref, shallowRef } from 'vue';
import { api, ApiRequestError } from '@/api/client';
import type { SweepSummary } from '@/stores/sweeps';
import { LIMIT_KEYS, type TargetSheet } from '@shared/targets/sheet.ts';
import { MAX_PAGE_ROWS } from '@shared/sweep/results-query.ts';
import { fromDesignRow, type DesignRowJson, type SteerSpan, type TradeDesign } from '@shared/trade/trade-design.ts';
import type { PointResult } from '@shared/sweep/chunk.ts';
import { queryString, scanWindowLabel, scanWindowParams, type ViewQuery } from '@/components/trade/trade-query';

/** Rows loaded for charts and ranking; beyond this the charts say they show the first rows of the current order. */
export const CHART_ROW_CAP = 20_000;
/** Rows per request when loading more than one page (the server's page limit). */
const BULK_PAGE = MAX_PAGE_ROWS;

/** A view to reopen (from the URL): which sweep, its sort and filters, the ticked designs and the picked point. */
export interface RestoredView {
  sweepId: string | null;
  view: ViewQuery;
  selected: number[];
  point: { designIndex: number; index: number } | null;
}

/** One of the study's target sheets as GET /api/studies/:id/target-sheets lists it. */
interface StudySheet {
  id: string;
  sheet: TargetSheet;
  presetName?: string | null;
}

/** One point of GET /api/sweeps/:id/results: the row a sweep stored. */
export type PointRow = PointResult;

interface Page<T> {
  rows: T[];
  total: number;
}

function pageOf<T>(body: unknown): Page<T> {
  if (Array.isArray(body)) return { rows: body as T[], total: body.length };
  const o = body as { rows?: T[]; items?: T[]; total?: number; count?: number };
  const rows = o.rows ?? o.items ?? [];
  return { rows, total: o.total ?? o.count ?? rows.length };
}

/** A sheet that sets no limit judges nothing: treat it as no sheet, so nothing shows a false "pass". */
function meaningful(sheet: TargetSheet | null | undefined): TargetSheet | null {
  if (!sheet) return null;
  return LIMIT_KEYS.some((k) => sheet[k] !== null && sheet[k] !== undefined && sheet[k] !== false) ? sheet : null;
}

export const useTradeStore = defineStore('trade', () => {
  const studyId = ref<string | null>(null);
  const sweeps = ref<SweepSummary[]>([]);
  const sweepId = ref<string | null>(null);
  const span = ref<SteerSpan | null>(null);
  const sheet = ref<TargetSheet | null>(null);
  const sheetName = ref<string | null>(null);
  let studySheets: StudySheet[] = [];
  const selected = ref<number[]>([]);
  const rows = shallowRef<TradeDesign[]>([]);
  const rowsTotal = ref(0);
  const loading = ref(false);
  const error = ref<string | null>(null);
  const view = ref<ViewQuery>({ sort: [], ranges: {} });
  const points = new Map<number, Promise<PointRow[]>>();
  /** The one point whose pattern cuts and u-v map the charts draw. */
  const pickedPoint = shallowRef<PointRow | null>(null);
  /** Which cost model priced the open sweep's cost figures (the designs endpoint says). */
  const costBasis = ref<SweepCostBasis | null>(null);

  const selectedRows = computed(() => {
    const set = new Set(selected.value);
    return rows.value.filter((r) => set.has(r.designIndex));
  });

  function fail(e: unknown): void {
    error.value = e instanceof ApiRequestError ? e.message : e instanceof Error ? e.message : String(e);
  }

  /**
   * Sweeps and target sheet of a study; picks the sweep `restore` names (a view from the URL) when the study has it,
   * else the one already chosen, else the newest finished sweep.
   */
  async function load(id: string, restore?: RestoredView): Promise<void> {
    studyId.value = id;
    loading.value = true;
    error.value = null;
    try {
      const [list, ts] = await Promise.all([
        api.get<unknown>(`/api/studies/${encodeURIComponent(id)}/sweeps`),
        api.get<StudySheet[]>(`/api/studies/${encodeURIComponent(id)}/target-sheets`).catch(() => [] as StudySheet[]),
      ]);
      sweeps.value = Array.isArray(list) ? (list as SweepSummary[]) : ((list as { sweeps?: SweepSummary[] }).sweeps ?? []);
      studySheets = Array.isArray(ts) ? ts : [];
      useSheetOf(null);
      const wanted = restore?.sweepId ? sweeps.value.find((s) => s.id === restore.sweepId) : undefined;
      const keep = sweeps.value.find((s) => s.id === sweepId.value);
      const pick = wanted ?? keep ?? sweeps.value.find((s) => s.status === 'done') ?? sweeps.value[0];
      if (pick) await openSweep(pick.id, wanted ? restore : undefined);
      else {
        sweepId.value = null;
        rows.value = [];
      }
    } catch (e) {
      fail(e);
    } finally {
      loading.value = false;
    }
  }

  /** The sheet that judges the open sweep: the one it names, else the study's first. */
  function useSheetOf(sheetId: string | null): void {
    const ts = studySheets.find((s) => s.id === sheetId) ?? studySheets[0];
    sheet.value = meaningful(ts?.sheet);
    sheetName.value = ts?.sheet?.name ?? ts?.presetName ?? null;
  }

  /** Opens a sweep; `restore` (a view from the URL) sets its sort, filters, ticked designs and picked point. */
  async function openSweep(id: string, restore?: RestoredView): Promise<void> {
    if (sweepId.value !== id) {
      selected.value = [];
      pickedPoint.value = null;
      points.clear();
      view.value = { sort: [], ranges: {} };
    }
    sweepId.value = id;
    useSheetOf(sweeps.value.find((s) => s.id === id)?.targetSheetId ?? null);
    if (restore) {
      view.value = restore.view;
      setSelected(restore.selected);
    }
    span.value = await steerSpan(id);
    await loadChartRows();
    if (restore?.point) await restorePoint(restore.point);
  }

  /** The point a URL names, fetched with its design's points (nothing when the sweep has no such point). */
  async function restorePoint(at: { designIndex: number; index: number }): Promise<void> {
    const p = (await pointsOf(at.designIndex).catch(() => [])).find((x) => x.index === at.index);
    if (p && sweepId.value) pickedPoint.value = p;
  }

  /**
   * The steering every design of the sweep covers (a grid is a product, so one span fits all designs), read as
   * the extremes of the stored points; the designs endpoint has no per-design steering range.
   */
  async function steerSpan(id: string): Promise<SteerSpan | null> {
    const one = (field: string, dir: 'asc' | 'desc') =>
      api
        .get<unknown>(`/api/sweeps/${encodeURIComponent(id)}/results?${queryString({ sort: [{ key: field, dir }], ranges: {} }, 0, 1)}`)
        .then((b) => Number(pageOf<PointRow>(b).rows[0]?.design?.[field] ?? NaN));
    const [azMinDeg, azMaxDeg, elMinDeg, elMaxDeg] = await Promise.all([
      one('steerAzDeg', 'asc'), one('steerAzDeg', 'desc'), one('steerElDeg', 'asc'), one('steerElDeg', 'desc'),
    ]);
    const all = [azMinDeg, azMaxDeg, elMinDeg, elMaxDeg];
    return all.every(Number.isFinite) ? { azMinDeg, azMaxDeg, elMinDeg, elMaxDeg } : null;
  }

  /** The sheet's scan range the design figures are judged over (null = every steering angle of the sweep). */
  const scanWindow = computed(() => scanWindowLabel(sheet.value));

  /** One page of designs in the grid's current sort and filter, with figures over the sheet's scan range. */
  async function fetchPage(q: ViewQuery, offset: number, limit: number): Promise<Page<TradeDesign>> {
    if (!sweepId.value) return { rows: [], total: 0 };
    const qs = queryString(q, offset, limit, scanWindowParams(sheet.value));
    const body = await api.get<unknown>(`/api/sweeps/${encodeURIComponent(sweepId.value)}/designs?${qs}`);
    const page = pageOf<DesignRowJson>(body);
    costBasis.value = (body as { cost?: SweepCostBasis }).cost ?? null;
    return { rows: page.rows.map((r) => fromDesignRow(r, span.value)), total: page.total };
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

  /** The points (one per steering angle) of one design, fetched once per sweep. */
  function pointsOf(designIndex: number): Promise<PointRow[]> {
    const id = sweepId.value;
    if (!id) return Promise.resolve([]);
    let p = points.get(designIndex);
    if (!p) {
      const q = queryString({ sort: [{ key: 'angleIndex', dir: 'asc' }], ranges: {} }, 0, MAX_PAGE_ROWS, { designIndex });
      p = api.get<unknown>(`/api/sweeps/${encodeURIComponent(id)}/results?${q}`).then((b) => pageOf<PointRow>(b).rows);
      p.catch(() => points.delete(designIndex));
      points.set(designIndex, p);
    }
    return p;
  }

  function setSelected(list: number[]): void {
    const next = [...new Set(list)].sort((a, b) => a - b);
    if (JSON.stringify(next) !== JSON.stringify(selected.value)) selected.value = next;
  }
  function toggleSelected(designIndex: number): void {
    setSelected(selected.value.includes(designIndex) ? selected.value.filter((d) => d !== designIndex) : [...selected.value, designIndex]);
  }

  function csvUrl(): string | null {
    return sweepId.value ? `/api/sweeps/${encodeURIComponent(sweepId.value)}/results.csv` : null;
  }

  return {
    studyId, sweeps, sweepId, span, sheet, sheetName, scanWindow, selected, selectedRows, rows, rowsTotal, loading, error, view, pickedPoint,
    load, openSweep, fetchPage, fetchAll, setView, pointsOf, setSelected, toggleSelected, csvUrl, costBasis,
  };
});
