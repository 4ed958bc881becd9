/**
 * Studies: the list the signed-in member sees, the open study, its target sheet and the presets.
 * Edits to the list are optimistic and roll back when the server refuses.
 */
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { studiesApi } from '@/api/studies';
import { ApiRequestError, errorMessage } from '@/api/errors';
import type { StudyCreate } from '@shared/schemas/study.ts';
import type { TargetPreset, TargetSheet } from '@shared/targets/index.ts';
import type { ImportOutcome, StudyRow, TargetSheetState } from '@shared/api/studies.ts';

export type { ImportOutcome, StudyRow, TargetSheetState } from '@shared/api/studies.ts';

export const useStudiesStore = defineStore('studies', () => {
  const list = ref<StudyRow[]>([]);
  const loading = ref(false);
  const loaded = ref(false);
  const error = ref<string | null>(null);
  const showArchived = ref(false);
  const current = ref<StudyRow | null>(null);
  const targetSheet = ref<TargetSheetState | null>(null);
  /** Every sheet of the open study, in order; the first is the default. */
  const targetSheets = ref<TargetSheetState[]>([]);
  const presets = ref<TargetPreset[]>([]);

  const visible = computed(() => list.value.filter((s) => showArchived.value || !s.archivedAt));

  async function fetchList(): Promise<void> {
    loading.value = true;
    error.value = null;
    try {
      list.value = await studiesApi.list(showArchived.value);
      loaded.value = true;
    } catch (err) {
      error.value = errorMessage(err);
    } finally {
      loading.value = false;
    }
  }

  async function create(input: Partial<StudyCreate> & { name: string }): Promise<StudyRow> {
    const created = await studiesApi.create(input);
    await fetchList();
    return list.value.find((s) => s.id === created.id) ?? created;
  }

  /** Applies `change` locally, sends it, and restores the row if the server refuses. */
  async function patch(id: string, change: { name?: string; description?: string; archived?: boolean }): Promise<void> {
    const row = list.value.find((s) => s.id === id);
    const before = row ? { ...row } : null;
    if (row) {
      if (change.name !== undefined) row.name = change.name;
      if (change.archived !== undefined) row.archivedAt = change.archived ? new Date().toISOString() : null;
    }
    try {
      const saved = await studiesApi.patch(id, change);
      if (row) Object.assign(row, { name: saved.name, archivedAt: saved.archivedAt, updatedAt: saved.updatedAt });
      if (current.value?.id === id) Object.assign(current.value, { name: saved.name, archivedAt: saved.archivedAt });
    } catch (err) {
      if (row && before) Object.assign(row, before);
      throw err;
    }
  }

  async function duplicate(id: string): Promise<void> {
    await studiesApi.duplicate(id);
    await fetchList();
  }

  async function remove(id: string): Promise<void> {
    const index = list.value.findIndex((s) => s.id === id);
    const removed = index >= 0 ? list.value.splice(index, 1)[0] : undefined;
    try {
      await studiesApi.remove(id);
    } catch (err) {
      if (removed) list.value.splice(index, 0, removed);
      throw err;
    }
  }

  async function exportFile(id: string): Promise<{ fileName: string; text: string }> {
    const file = await studiesApi.exportFile(id);
    const base = file.study.name.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '') || 'study';
    return { fileName: `${base}.lobewise.json`, text: JSON.stringify(file, null, 2) };
  }

  /** Imports a study file's text; a file that is not JSON fails here naming the file, a bad field fails on the server. */
  async function importText(text: string): Promise<ImportOutcome> {
    let body: unknown;
    try {
      body = JSON.parse(text);
    } catch {
      throw new ApiRequestError(400, 'invalid_json', 'file: is not valid JSON', [{ field: 'file', message: 'is not valid JSON' }]);
    }
    const outcome = await studiesApi.importFile(body);
    await fetchList();
    return outcome;
  }

  async function open(id: string): Promise<void> {
    if (current.value?.id !== id) {
      current.value = null;
      targetSheet.value = null;
      targetSheets.value = [];
    }
    current.value = await studiesApi.get(id);
  }

  async function loadTargetSheet(studyId: string): Promise<TargetSheetState> {
    targetSheet.value = await studiesApi.targetSheet(studyId);
    return targetSheet.value;
  }

  async function saveTargetSheet(studyId: string, preset: string | null, sheet: TargetSheet): Promise<TargetSheetState> {
    targetSheet.value = await studiesApi.saveTargetSheet(studyId, preset, sheet);
    return targetSheet.value;
  }

  async function loadTargetSheets(studyId: string): Promise<TargetSheetState[]> {
    targetSheets.value = await studiesApi.targetSheets(studyId);
    targetSheet.value = targetSheets.value[0] ?? targetSheet.value;
    return targetSheets.value;
  }

  async function addTargetSheet(studyId: string, preset: string | null, sheet: TargetSheet): Promise<TargetSheetState> {
    const created = await studiesApi.addTargetSheet(studyId, preset, sheet);
    await loadTargetSheets(studyId);
    return created;
  }

  async function saveTargetSheetById(studyId: string, sheetId: string, preset: string | null, sheet: TargetSheet): Promise<TargetSheetState> {
    const saved = await studiesApi.saveTargetSheetById(studyId, sheetId, preset, sheet);
    await loadTargetSheets(studyId);
    return saved;
  }

  async function removeTargetSheet(studyId: string, sheetId: string): Promise<void> {
    await studiesApi.removeTargetSheet(studyId, sheetId);
    await loadTargetSheets(studyId);
    if (targetSheets.value.length === 0) await loadTargetSheet(studyId);
  }

  /** The sheet that judges something naming `sheetId` (the study's first when it names none or a removed one). */
  function sheetFor(sheetId: string | null | undefined): TargetSheetState | null {
    return targetSheets.value.find((s) => s.id === sheetId) ?? targetSheets.value[0] ?? targetSheet.value;
  }

  async function loadPresets(): Promise<TargetPreset[]> {
    if (presets.value.length === 0) presets.value = await studiesApi.presets();
    return presets.value;
  }

  return {
    list, visible, loading, loaded, error, showArchived, current, targetSheet, targetSheets, presets,
    fetchList, create, patch, duplicate, remove, exportFile, importText, open, loadTargetSheet, saveTargetSheet, loadPresets,
    loadTargetSheets, addTargetSheet, saveTargetSheetById, removeTargetSheet, sheetFor,
  };
});
