/**
 * The trade table's state for the open study, composed of one part per concern (src/stores/trade/): which sweep
 * is shown and the sheet that judges it, its design rows (paged for the grid, in full up to a cap for the charts
 * and ranking), the points of a design with the picked one, and the designs ticked to compare.
 */
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { errorMessage } from '@/api/errors';
import { sweepsApi } from '@/api/sweeps';
import { scanWindowLabel, type ViewQuery } from '@/api/results-query';
import type { PointResult } from '@shared/sweep/chunk.ts';
import { DEVICE_SWEEP_FIELDS } from '@shared/devices/device-sweep.ts';
import type { SteerSpan } from '@shared/trade/trade-design.ts';
import { useDesignPoints } from './trade/design-points';
import { useDesignRows } from './trade/design-rows';
import { useSelection } from './trade/selection';
import { useSweepChoice } from './trade/sweep-choice';

export { CHART_ROW_CAP } from './trade/design-rows';

/** A view to reopen (from the URL): which sweep, its sort and filters, the ticked designs and the picked point. */
export interface RestoredView {
  sweepId: string | null;
  view: ViewQuery;
  selected: number[];
  point: { designIndex: number; index: number } | null;
}

/** One point of GET /api/sweeps/:id/results: the row a sweep stored. */
export type PointRow = PointResult;

export const useTradeStore = defineStore('trade', () => {
  const loading = ref(false);
  const error = ref<string | null>(null);
  const fail = (e: unknown) => (error.value = errorMessage(e));
  /** The steering every design of the open sweep covers (a grid is a product, so one span fits all). */
  const span = ref<SteerSpan | null>(null);

  const choice = useSweepChoice();
  /** The open sweep's device when it is a sweep over a device (its rows are then coverage figures). */
  const device = computed(() => choice.sweeps.value.find((s) => s.id === choice.sweepId.value)?.device ?? null);
  /** The parameters a device sweep varies (its table's parameter columns); null for a grid sweep. */
  const deviceVaried = computed(() => (device.value ? DEVICE_SWEEP_FIELDS.filter((k) => device.value!.vary[k]) : null));
  const designs = useDesignRows(choice.sweepId, choice.sheet, span, fail, device);
  const points = useDesignPoints(choice.sweepId);
  const selection = useSelection(designs.rows);

  /**
   * Sweeps and target sheet of a study; picks the sweep `restore` names (a view from the URL) when the study has it,
   * else the one already chosen, else the newest finished sweep.
   */
  async function load(id: string, restore?: RestoredView): Promise<void> {
    loading.value = true;
    error.value = null;
    try {
      await choice.loadStudy(id);
      const list = choice.sweeps.value;
      const wanted = restore?.sweepId ? list.find((s) => s.id === restore.sweepId) : undefined;
      const keep = list.find((s) => s.id === choice.sweepId.value);
      const pick = wanted ?? keep ?? list.find((s) => s.status === 'done') ?? list[0];
      if (pick) await openSweep(pick.id, wanted ? restore : undefined);
      else {
        choice.sweepId.value = null;
        designs.rows.value = [];
      }
    } catch (e) {
      fail(e);
    } finally {
      loading.value = false;
    }
  }

  /** Opens a sweep; `restore` (a view from the URL) sets its sort, filters, ticked designs and picked point. */
  async function openSweep(id: string, restore?: RestoredView): Promise<void> {
    if (choice.sweepId.value !== id) {
      selection.selected.value = [];
      points.forget();
      designs.view.value = { sort: [], ranges: {} };
    }
    choice.choose(id);
    if (restore) {
      designs.view.value = restore.view;
      selection.setSelected(restore.selected);
    }
    span.value = (await sweepsApi.steerSpan(id)).span;
    await designs.loadChartRows();
    if (restore?.point) await points.restorePoint(restore.point);
  }

  /** The sheet's scan range the design figures are judged over (null = every steering angle of the sweep). */
  const scanWindow = computed(() => (device.value ? null : scanWindowLabel(choice.sheet.value)));

  function csvUrl(): string | null {
    return choice.sweepId.value ? sweepsApi.csvUrl(choice.sweepId.value) : null;
  }

  return {
    studyId: choice.studyId, sweeps: choice.sweeps, sweepId: choice.sweepId, device, deviceVaried, span, sheet: choice.sheet, sheetName: choice.sheetName, scanWindow,
    selected: selection.selected, selectedRows: selection.selectedRows, rows: designs.rows, rowsTotal: designs.rowsTotal, loading, error,
    view: designs.view, pickedPoint: points.pickedPoint, costBasis: designs.costBasis,
    load, openSweep, fetchPage: designs.fetchPage, fetchAll: designs.fetchAll, setView: designs.setView, pointsOf: points.pointsOf,
    setSelected: selection.setSelected, toggleSelected: selection.toggleSelected, csvUrl,
  };
});
