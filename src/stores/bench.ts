/**
 * Bench work for one candidate at a time: the codes table, calibration, typed codes, range data
 * (uploads grouped into sets), beam squint and the Monte Carlo error tolerance. Every call goes to the API.
 */
import { defineStore } from 'pinia';
import { ref } from 'vue';
import { api } from '@/api/client';
import type { CodesTable } from '@shared/bench/codes-table.ts';
import type { Calibration } from '@shared/bench/calibration.ts';
import type { ManualCodesResult } from '@shared/bench/manual-codes.ts';
import type { SquintResult } from '@shared/bench/beam-squint.ts';
import type { MonteCarloSummary } from '@shared/bench/monte-carlo-summary.ts';
import type { MonteCarloOptionsInput } from '@shared/bench/monte-carlo-schema.ts';
import type { CutAnalysis } from '@shared/bench/analyse-cut.ts';
import type { MeasurementAnalysis } from '@shared/bench/analyse-measurement.ts';
import type { RangeData } from '@shared/bench/parse-range-csv.ts';
import type { Beam } from '@shared/bench/beam.ts';
import { errorMessage } from '@/api/errors';

export interface CalibrationView {
  candidateId: string;
  offsets: Calibration;
  sourceFilename: string | null;
  updatedAt: string | null;
}

export interface UploadSummary {
  id: string;
  candidateId: string;
  beam: Beam & { codes: number[] };
  setName: string;
  originalFilename: string;
  createdAt: string;
  cuts: { plane: 'az' | 'el'; name: string; measured: CutAnalysis; model: CutAnalysis; difference: { peakDeg: number; hpbwDeg: number; sllDb: number | null } }[];
}
export interface UploadDetail extends UploadSummary {
  parsed: RangeData;
  analysis: MeasurementAnalysis;
}
export interface UploadSet {
  setName: string;
  candidateId: string;
  uploads: UploadSummary[];
}

export type SquintView = SquintResult & { band: { id: string | null; lowGHz: number; highGHz: number; source: string | null } };

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
    calibration.value = await call(() => api.get<CalibrationView>(`/api/candidates/${id}/calibration`));
  }

  const path = (tail: string) => `/api/candidates/${candidateId.value}/${tail}`;

  async function loadCodes(beams: string | Beam[], pointingThresholdDeg: number | null, useCalibration: boolean): Promise<void> {
    table.value = await call(() => api.post<CodesTable>(path('codes'), { beams, pointingThresholdDeg, calibration: useCalibration ? 'stored' : 'none' }));
  }

  function csvUrl(beams: string, thresholdDeg: number | null, useCalibration: boolean): string {
    const q = new URLSearchParams({ beams, calibration: useCalibration ? 'stored' : 'none' });
    if (thresholdDeg !== null) q.set('threshold', String(thresholdDeg));
    return `${path('codes.csv')}?${q.toString()}`;
  }

  async function saveCalibration(offsets: Calibration | File): Promise<void> {
    const body = offsets instanceof File ? formWith({ file: offsets }) : { offsets };
    calibration.value = await call(() => api.put<CalibrationView>(path('calibration'), body));
  }

  async function runManual(codes: number[], useCalibration: boolean): Promise<void> {
    manual.value = await call(() => api.post<ManualCodesResult>(path('manual-codes'), { codes, calibration: useCalibration ? 'stored' : 'none' }));
  }

  async function loadSets(studyId: string): Promise<void> {
    sets.value = (await call(() => api.get<{ sets: UploadSet[] }>(`/api/studies/${studyId}/range-data`))).sets;
  }

  async function upload(studyId: string, file: File, fields: { azDeg: number; elDeg: number; codes: string; setName: string }): Promise<UploadDetail> {
    const form = formWith({ file, azDeg: String(fields.azDeg), elDeg: String(fields.elDeg), codes: fields.codes, setName: fields.setName });
    const made = await call(() => api.post<UploadDetail>(path('range-data'), form));
    detail.value = made;
    await loadSets(studyId);
    return made;
  }

  async function openUpload(id: string): Promise<void> {
    detail.value = await call(() => api.get<UploadDetail>(`/api/range-data/${id}`));
  }

  async function removeUpload(studyId: string, id: string): Promise<void> {
    await call(() => api.delete(`/api/range-data/${id}`));
    if (detail.value?.id === id) detail.value = null;
    await loadSets(studyId);
  }

  async function runSquint(beam: Beam, band: string | { lowGHz: number; highGHz: number }, points: number): Promise<void> {
    squint.value = await call(() => api.post<SquintView>(path('squint'), { beam, band, points }));
  }

  async function runMonteCarlo(options: MonteCarloOptionsInput): Promise<void> {
    monteCarlo.value = await call(() => api.post<MonteCarloSummary>(path('monte-carlo'), options));
  }

  return { candidateId, table, calibration, manual, sets, detail, squint, monteCarlo, busy, error, selectCandidate, loadCodes, csvUrl, saveCalibration, runManual, loadSets, upload, openUpload, removeUpload, runSquint, runMonteCarlo };
});

function formWith(fields: Record<string, string | File>): FormData {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) if (v !== '') form.append(k, v);
  return form;
}
