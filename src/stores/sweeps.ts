/**
 * Sweeps of the open study: the candidates a sweep can start from, the past sweeps with their status, starting
 * one, following its progress (server-sent events, read by the component) and cancelling it.
 */
import { defineStore } from 'pinia';
import { ref } from 'vue';
import { errorMessage } from '@/api/errors';
import { candidatesApi } from '@/api/candidates';
import { sweepsApi, type SweepStart } from '@/api/sweeps';
import type { CandidateDesign, SweepCreated, SweepProgress, SweepStatus } from '@shared/api/sweeps.ts';
import { useCandidatesStore } from '@/stores/candidates';
import type { DeviceSweepRequest } from '@shared/devices/device-sweep.ts';

export type { SweepProgress, SweepStatus } from '@shared/api/sweeps.ts';

export interface CandidateSummary {
  id: string;
  name: string;
  design: CandidateDesign;
  /** The study's target sheet that judges it; null: the study's first. */
  targetSheetId?: string | null;
}

/**
 * A sweep in the list: what the server answers, or (just after starting one, before the list is read again) the
 * fields the client knows.
 */
export type SweepSummary = Pick<SweepProgress, 'id' | 'name' | 'status' | 'pointsTotal' | 'pointsDone' | 'createdAt' | 'targetSheetId'> &
  Partial<SweepProgress>;

export const FINAL_STATUSES: readonly SweepStatus[] = ['done', 'failed', 'cancelled'];

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
      const [c, s] = await Promise.all([candidatesApi.list(id), sweepsApi.list(id)]);
      candidates.value = c as CandidateSummary[];
      sweeps.value = s;
    } catch (e) {
      error.value = errorMessage(e);
    } finally {
      loading.value = false;
    }
  }

  async function refreshSweeps(): Promise<void> {
    if (!studyId.value) return;
    sweeps.value = await sweepsApi.list(studyId.value);
  }

  /** Starts a sweep; the caller shows formFailure(err).fields beside the form's fields. */
  async function start(body: SweepStart): Promise<SweepCreated> {
    if (!studyId.value) throw new Error('no study open');
    const created = await sweepsApi.start(studyId.value, body);
    sweeps.value = [
      { id: created.id, name: body.name, status: 'queued', pointsTotal: created.pointsTotal, pointsDone: 0, createdAt: new Date().toISOString(), targetSheetId: body.targetSheetId ?? null },
      ...sweeps.value,
    ];
    return created;
  }

  /** Starts a sweep over one module of a device (in the device's study); field failures as for start(). */
  async function startOverDevice(deviceId: string, body: DeviceSweepRequest): Promise<SweepCreated> {
    const created = await sweepsApi.startOverDevice(deviceId, body);
    sweeps.value = [
      { id: created.id, name: body.name ?? 'Device sweep', status: 'queued', pointsTotal: created.pointsTotal, pointsDone: 0, createdAt: new Date().toISOString(), targetSheetId: null },
      ...sweeps.value,
    ];
    return created;
  }

  async function cancel(id: string): Promise<void> {
    await sweepsApi.cancel(id);
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

  const eventsUrl = (id: string): string => sweepsApi.eventsUrl(id);

  return { studyId, candidates, sweeps, loading, error, load, refreshSweeps, start, startOverDevice, cancel, applyProgress, eventsUrl };
});
