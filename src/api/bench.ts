/** Bench work on one candidate: codes, calibration, typed codes, range data, beam squint, Monte Carlo tolerance. */
import type { CalibrationView, SquintView, UploadDetail, UploadSet } from '@shared/api/bench.ts';
import type { Beam } from '@shared/bench/beam.ts';
import type { Calibration } from '@shared/bench/calibration.ts';
import type { CodesTable } from '@shared/bench/codes-table.ts';
import type { ManualCodesResult } from '@shared/bench/manual-codes.ts';
import type { MonteCarloOptionsInput } from '@shared/bench/monte-carlo-schema.ts';
import type { MonteCarloSummary } from '@shared/bench/monte-carlo-summary.ts';
import { api } from './client';

const candidate = (id: string, tail: string) => `/api/candidates/${encodeURIComponent(id)}/${tail}`;
type CalibrationChoice = 'stored' | 'none';

export const benchApi = {
  calibration: (candidateId: string) => api.get<CalibrationView>(candidate(candidateId, 'calibration')),
  /** Offsets as JSON, or a multipart form carrying a calibration file. */
  saveCalibration: (candidateId: string, body: { offsets: Calibration } | FormData) => api.put<CalibrationView>(candidate(candidateId, 'calibration'), body),
  codes: (candidateId: string, body: { beams: string | Beam[]; pointingThresholdDeg: number | null; calibration: CalibrationChoice }) =>
    api.post<CodesTable>(candidate(candidateId, 'codes'), body),
  codesCsvUrl: (candidateId: string, query: URLSearchParams) => `${candidate(candidateId, 'codes.csv')}?${query.toString()}`,
  manualCodes: (candidateId: string, body: { codes: number[]; calibration: CalibrationChoice }) => api.post<ManualCodesResult>(candidate(candidateId, 'manual-codes'), body),
  rangeSets: (studyId: string) => api.get<{ sets: UploadSet[] }>(`/api/studies/${encodeURIComponent(studyId)}/range-data`),
  upload: (candidateId: string, form: FormData) => api.post<UploadDetail>(candidate(candidateId, 'range-data'), form),
  uploadDetail: (id: string) => api.get<UploadDetail>(`/api/range-data/${encodeURIComponent(id)}`),
  removeUpload: (id: string) => api.delete<void>(`/api/range-data/${encodeURIComponent(id)}`),
  squint: (candidateId: string, body: { beam: Beam; band: string | { lowGHz: number; highGHz: number }; points: number }) =>
    api.post<SquintView>(candidate(candidateId, 'squint'), body),
  monteCarlo: (candidateId: string, options: MonteCarloOptionsInput) => api.post<MonteCarloSummary>(candidate(candidateId, 'monte-carlo'), options),
};
