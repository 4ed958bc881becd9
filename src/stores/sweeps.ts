/**
 * Sweeps of the open study: the candidates a sweep can start from, the past sweeps with their status, starting
 * one, following its progress (server-sent events, read by the component) and cancelling it.
 */
import { defineStore } from 'pinia';
import { ref } from 'vue';
import { api, ApiRequestError } from '@/api/client';
import type { SweepConstraints, SweepGridInput } from '@shared/sweep/grid-schema.ts';
import type { CandidateDesign } from '@/components/sweep/sweep-form';
import { useCandidatesStore } from '@/stores/candidates';

export type SweepStatus = 'queued' | 'running' | 'done' | 'failed' | 'cancelled';

export interface CandidateSummary {
  id: string;
  name: string;
  design: CandidateDesign;
  /** The study's target sheet that judges it; null: the study's first. */
  targetSheetId?: string | null;
}

export interface SweepSummary {
  id: string;
  name: string;
  status: SweepStatus;
  pointsTotal: number;
  pointsDone: number;
  pointsFailed?: number;
  createdAt?: string;
  finishedAt?: string | null;
  /** The study's target sheet that judges its designs; null: the study's first. */
  targetSheetId?: string | null;
}

/** One progress message of GET /api/sweeps/:id/events. */
export interface SweepProgress {
  status: SweepStatus;
  pointsDone: number;
  pointsTotal: number;
  /** Points per second since the sweep started. */
  ratePerSecond: number | null;
  etaSeconds: number | null;
}

export const FINAL_STATUSES: readonly SweepStatus[] = ['done', 'failed', 'cancelled'];

/** Lists come back bare or wrapped ({ items } / { sweeps }); accept each so a small server change does not blank the page. */
function listOf<T>(body: unknown, key: string): T[] {
  if (Array.isArray(body)) return body as T[];
  const o = body as Record<string, unknown> | null;
  const inner = o?.[key] ?? o?.items;
  return Array.isArray(inner) ? (inner as T[]) : [];
}

export const useSweepsStore = defineStore('sweeps', () => {
  const studyId = ref<string | null>(null);
  const candidates = ref<CandidateSummary[]>([]);
  const sweeps = ref<SweepSummary[]>([]);
  const loading = ref(false);
  const error = ref<string | null>(null);

  async function load(id: string): Promise<void> {
    studyId.value = id;
    loading.value = true;
    error.value = null;
    try {
      // An edit saved as the Candidates tab closed must land before we read the candidates back.
      await useCandidatesStore().settled();
      const [c, s] = await Promise.all([
        api.get<unknown>(`/api/studies/${encodeURIComponent(id)}/candidates`),
        api.get<unknown>(`/api/studies/${encodeURIComponent(id)}/sweeps`),
      ]);
      candidates.value = listOf<CandidateSummary>(c, 'candidates');
      sweeps.value = listOf<SweepSummary>(s, 'sweeps');
    } catch (e) {
      error.value = e instanceof ApiRequestError ? e.message : String(e);
    } finally {
      loading.value = false;
    }
  }

  async function refreshSweeps(): Promise<void> {
    if (!studyId.value) return;
    sweeps.value = listOf<SweepSummary>(await api.get<unknown>(`/api/studies/${encodeURIComponent(studyId.value)}/sweeps`), 'sweeps');
  }

  /** Starts a sweep; the caller shows ApiRequestError.fields beside the form's fields. */
  async function start(body: { name: string; grid: SweepGridInput; constraints?: SweepConstraints; targetSheetId?: string | null }): Promise<{ id: string; pointsTotal: number }> {
    if (!studyId.value) throw new Error('no study open');
    const created = await api.post<{ id: string; pointsTotal: number }>(`/api/studies/${encodeURIComponent(studyId.value)}/sweeps`, body);
    sweeps.value = [
      { id: created.id, name: body.name, status: 'queued', pointsTotal: created.pointsTotal, pointsDone: 0, createdAt: new Date().toISOString(), targetSheetId: body.targetSheetId ?? null },
      ...sweeps.value,
    ];
    return created;
  }

  async function cancel(id: string): Promise<void> {
    await api.post(`/api/sweeps/${encodeURIComponent(id)}/cancel`);
    applyProgress(id, { status: 'cancelled' });
  }

  /** Folds a progress message into the list, so the list and the bar agree. */
  function applyProgress(id: string, p: Partial<SweepProgress>): void {
    sweeps.value = sweeps.value.map((s) =>
      s.id === id
        ? { ...s, status: p.status ?? s.status, pointsDone: p.pointsDone ?? s.pointsDone, pointsTotal: p.pointsTotal ?? s.pointsTotal }
        : s,
    );
  }

  function eventsUrl(id: string): string {
    return `/api/sweeps/${encodeURIComponent(id)}/events`;
  }

  return { studyId, candidates, sweeps, loading, error, load, refreshSweeps, start, cancel, applyProgress, eventsUrl };
});
