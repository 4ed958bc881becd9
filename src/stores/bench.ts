/**
 * Bench work for one candidate at a time: the codes table, calibration, typed codes, range data
 * (uploads grouped into sets), beam squint and the Monte Carlo error tolerance. Every call goes to the API.
 */
import { defineStore } from 'pinia';
import { ref } from 'vue';
import { benchApi } from '@/api/bench';
import type { CalibrationView, SquintView, UploadDetail, UploadSet } from '@shared/api/bench.ts';
import type { CodesTable } from '@shared/bench/codes-table.ts';
import type { Calibration } from '@shared/bench/calibration.ts';
import type { ManualCodesResult } from '@shared/bench/manual-codes.ts';
import type { MonteCarloSummary } from '@shared/bench/monte-carlo-summary.ts';
import type { MonteCarloOptionsInput } from '@shared/bench/monte-carlo-schema.ts';
import type { Beam } from '@shared/bench/beam.ts';
import { errorMessage } from '@/api/errors';

export type { CalibrationView, SquintView, UploadDetail, UploadSet, UploadSummary } from '@shared/api/bench.ts';

export const useBenchStore = defineStore('bench', () => {
  const candidateId = ref<string | null>(null);
  const table = ref<CodesTable | null>(null);
  const calibration = ref<CalibrationView | null>(null);
  const manual = ref<ManualCodesResult | null>(null);
  const sets = ref<UploadSet[]>([]);
  const detail = ref<UploadDetail | null>(null);
  const squint = ref<SquintView | null>(null);
  const monteCarlo = ref<MonteCarloSummary | null>(null);
  const busy = ref(false);
  const error = ref<string | null>(null);

  /** Runs one call with the shared busy flag and error text; rethrows so forms can show field errors. */
  async function call<T>(f: () => Promise<T>): Promise<T> {
    busy.value = true;
    error.value = null;
    try {
      return await f();
    } catch (err) {
      error.value = errorMessage(err);
      throw err;
    } finally {
      busy.value = false;
    }
  }

  async function selectCandidate(id: string): Promise<void> {
    if (candidateId.value !== id) {
      table.value = null;
      manual.value = null;
      squint.value = null;
      monteCarlo.value = null;
    }
    candidateId.value = id;
    calibration.value = await call(() => benchApi.calibration(id));
  }

  /** The candidate every call below works on (selectCandidate first). */
  const cid = (): string => {
    if (!candidateId.value) throw new Error('no candidate is selected');
    return candidateId.value;
  };

  async function loadCodes(beams: string | Beam[], pointingThresholdDeg: number | null, useCalibration: boolean): Promise<void> {
    table.value = await call(() => benchApi.codes(cid(), { beams, pointingThresholdDeg, calibration: useCalibration ? 'stored' : 'none' }));
  }

  function csvUrl(beams: string, thresholdDeg: number | null, useCalibration: boolean): string {
    const q = new URLSearchParams({ beams, calibration: useCalibration ? 'stored' : 'none' });
    if (thresholdDeg !== null) q.set('threshold', String(thresholdDeg));
    return benchApi.codesCsvUrl(String(candidateId.value), q);
  }

  async function saveCalibration(offsets: Calibration | File): Promise<void> {
    const body = offsets instanceof File ? formWith({ file: offsets }) : { offsets };
    calibration.value = await call(() => benchApi.saveCalibration(cid(), body));
  }

  async function runManual(codes: number[], useCalibration: boolean): Promise<void> {
    manual.value = await call(() => benchApi.manualCodes(cid(), { codes, calibration: useCalibration ? 'stored' : 'none' }));
  }

  async function loadSets(studyId: string): Promise<void> {
    sets.value = (await call(() => benchApi.rangeSets(studyId))).sets;
  }

  async function upload(studyId: string, file: File, fields: { azDeg: number; elDeg: number; codes: string; setName: string }): Promise<UploadDetail> {
    const form = formWith({ file, azDeg: String(fields.azDeg), elDeg: String(fields.elDeg), codes: fields.codes, setName: fields.setName });
    const made = await call(() => benchApi.upload(cid(), form));
    detail.value = made;
    await loadSets(studyId);
    return made;
  }

  async function openUpload(id: string): Promise<void> {
    detail.value = await call(() => benchApi.uploadDetail(id));
  }

  async function removeUpload(studyId: string, id: string): Promise<void> {
    await call(() => benchApi.removeUpload(id));
    if (detail.value?.id === id) detail.value = null;
    await loadSets(studyId);
  }

  async function runSquint(beam: Beam, band: string | { lowGHz: number; highGHz: number }, points: number): Promise<void> {
    squint.value = await call(() => benchApi.squint(cid(), { beam, band, points }));
  }

  async function runMonteCarlo(options: MonteCarloOptionsInput): Promise<void> {
    monteCarlo.value = await call(() => benchApi.monteCarlo(cid(), options));
  }

  return { candidateId, table, calibration, manual, sets, detail, squint, monteCarlo, busy, error, selectCandidate, loadCodes, csvUrl, saveCalibration, runManual, loadSets, upload, openUpload, removeUpload, runSquint, runMonteCarlo };
});

function formWith(fields: Record<string, string | File>): FormData {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) if (v !== '') form.append(k, v);
  return form;
}
