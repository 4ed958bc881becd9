/**
 * Candidates of the open study, which of them is being edited, and which are picked to overlay their cuts.
 * Saving a design is explicit (the editor saves after a pause); renames and deletes are optimistic.
 */
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { candidatesApi } from '@/api/candidates';
import type { CandidateRow } from '@shared/api/candidates.ts';
import type { DesignInput } from '@shared/schemas/design.ts';
import { errorMessage } from '@/api/errors';

export type { CandidateRow } from '@shared/api/candidates.ts';

/** A first candidate that evaluates at once: a 4-element 28 GHz row at half a wavelength. */
export const STARTER_DESIGN: DesignInput = {
  frequencyGHz: 28,
  nx: 4,
  ny: 1,
  dxMm: 5.35,
  taperX: { kind: 'uniform' },
  taperY: { kind: 'uniform' },
  phaseBits: 6,
  grouping: 'element',
  element: { kind: 'cosine', q: 1.5 },
  steerAzDeg: 0,
  steerElDeg: 0,
  channelPowerDbm: 10,
};

export const useCandidatesStore = defineStore('candidates', () => {
  const studyId = ref<string | null>(null);
  const list = ref<CandidateRow[]>([]);
  const loading = ref(false);
  const error = ref<string | null>(null);
  const selectedId = ref<string | null>(null);
  /** Candidates picked for the overlay of cuts. */
  const overlayIds = ref<string[]>([]);

  const selected = computed(() => list.value.find((c) => c.id === selectedId.value) ?? null);
  const overlay = computed(() => list.value.filter((c) => overlayIds.value.includes(c.id)));

  async function load(id: string): Promise<void> {
    if (studyId.value !== id) {
      list.value = [];
      selectedId.value = null;
      overlayIds.value = [];
    }
    studyId.value = id;
    loading.value = true;
    error.value = null;
    try {
      list.value = await candidatesApi.list(id);
      if (!selected.value) selectedId.value = list.value[0]?.id ?? null;
    } catch (err) {
      error.value = errorMessage(err);
    } finally {
      loading.value = false;
    }
  }

  async function create(name: string, design: DesignInput = STARTER_DESIGN): Promise<CandidateRow> {
    if (!studyId.value) throw new Error('no study is open');
    const created = await candidatesApi.create(studyId.value, name, design);
    list.value.push(created);
    selectedId.value = created.id;
    return created;
  }

  const inFlight = new Set<Promise<unknown>>();

  async function saveDesign(id: string, design: DesignInput): Promise<CandidateRow> {
    const request = candidatesApi.patch(id, { design });
    inFlight.add(request);
    try {
      const saved = await request;
      const row = list.value.find((c) => c.id === id);
      if (row) Object.assign(row, saved);
      return saved;
    } finally {
      inFlight.delete(request);
    }
  }

  /** Resolves once every design save under way has finished, so a reader of the server sees the latest edit. */
  async function settled(): Promise<void> {
    await Promise.allSettled([...inFlight]);
  }

  async function rename(id: string, name: string): Promise<void> {
    const row = list.value.find((c) => c.id === id);
    const before = row?.name;
    if (row) row.name = name;
    try {
      await candidatesApi.patch(id, { name });
    } catch (err) {
      if (row && before !== undefined) row.name = before;
      throw err;
    }
  }

  /** Points the candidate at one of the study's sheets (null: the study's first). */
  async function setSheet(id: string, targetSheetId: string | null): Promise<void> {
    const saved = await candidatesApi.patch(id, { targetSheetId });
    const row = list.value.find((c) => c.id === id);
    if (row) row.targetSheetId = saved.targetSheetId ?? null;
  }

  async function remove(id: string): Promise<void> {
    const index = list.value.findIndex((c) => c.id === id);
    const removed = index >= 0 ? list.value.splice(index, 1)[0] : undefined;
    try {
      await candidatesApi.remove(id);
      overlayIds.value = overlayIds.value.filter((x) => x !== id);
      if (selectedId.value === id) selectedId.value = list.value[0]?.id ?? null;
    } catch (err) {
      if (removed) list.value.splice(index, 0, removed);
      throw err;
    }
  }

  function select(id: string): void {
    selectedId.value = id;
  }

  function toggleOverlay(id: string): void {
    overlayIds.value = overlayIds.value.includes(id) ? overlayIds.value.filter((x) => x !== id) : [...overlayIds.value, id];
  }

  return { studyId, list, loading, error, selectedId, selected, overlayIds, overlay, load, create, saveDesign, settled, rename, setSheet, remove, select, toggleOverlay };
});
