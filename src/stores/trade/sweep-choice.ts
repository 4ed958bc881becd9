/** Part of the trade store: the study's sweeps, which one is open, and the target sheet that judges it. */
import { ref } from 'vue';
import { sweepsApi } from '@/api/sweeps';
import { studiesApi } from '@/api/studies';
import type { TargetSheetState } from '@shared/api/studies.ts';
import { LIMIT_KEYS, type TargetSheet } from '@shared/targets/sheet.ts';
import type { SweepSummary } from '@/stores/sweeps';

/** A sheet that sets no limit judges nothing: treat it as no sheet, so nothing shows a false "pass". */
function meaningful(sheet: TargetSheet | null | undefined): TargetSheet | null {
  if (!sheet) return null;
  return LIMIT_KEYS.some((k) => sheet[k] !== null && sheet[k] !== undefined && sheet[k] !== false) ? sheet : null;
}

export function useSweepChoice() {
  const studyId = ref<string | null>(null);
  const sweeps = ref<SweepSummary[]>([]);
  const sweepId = ref<string | null>(null);
  const sheet = ref<TargetSheet | null>(null);
  const sheetName = ref<string | null>(null);
  let studySheets: TargetSheetState[] = [];

  /** Reads the study's sweeps and sheets (a study whose sheets cannot be read is judged by none). */
  async function loadStudy(id: string): Promise<void> {
    studyId.value = id;
    const [list, ts] = await Promise.all([sweepsApi.list(id), studiesApi.targetSheets(id).catch(() => [] as TargetSheetState[])]);
    sweeps.value = list;
    studySheets = ts;
    useSheetOf(null);
  }

  /** The sheet that judges the open sweep: the one it names, else the study's first. */
  function useSheetOf(sheetId: string | null): void {
    const ts = studySheets.find((s) => s.id === sheetId) ?? studySheets[0];
    sheet.value = meaningful(ts?.sheet);
    sheetName.value = ts?.sheet?.name ?? ts?.presetName ?? null;
  }

  /** Makes `id` the open sweep and picks its sheet. */
  function choose(id: string): void {
    sweepId.value = id;
    useSheetOf(sweeps.value.find((s) => s.id === id)?.targetSheetId ?? null);
  }

  return { studyId, sweeps, sweepId, sheet, sheetName, loadStudy, choose };
}
