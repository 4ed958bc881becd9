/**
 * A study's uploaded element patterns: the list (for the element picker), each grid once fetched (for the preview
 * plot and for filling `element.pattern` before the browser's preview evaluates a table element), upload, delete.
 */
import { defineStore } from 'pinia';
import { ref, shallowRef } from 'vue';
import { elementPatternsApi } from '@/api/element-patterns';
import type { PatternSummary } from '@shared/api/element-patterns.ts';
import type { DesignInput } from '@shared/schemas/design.ts';
import type { ElementPattern } from '@shared/schemas/element-pattern.ts';
import { errorMessage } from '@/api/errors';

export type { PatternSummary } from '@shared/api/element-patterns.ts';

export const useElementPatternsStore = defineStore('elementPatterns', () => {
  const studyId = ref<string | null>(null);
  const list = ref<PatternSummary[]>([]);
  // Grids are large and never edited: a shallow map, one object per id (the engine caches per object).
  const grids = shallowRef(new Map<string, ElementPattern>());
  const busy = ref(false);
  const error = ref<string | null>(null);

  async function load(id: string): Promise<void> {
    if (studyId.value !== id) grids.value = new Map();
    studyId.value = id;
    try {
      list.value = await elementPatternsApi.list(id);
      error.value = null;
    } catch (err) {
      error.value = errorMessage(err);
    }
  }

  async function grid(id: string): Promise<ElementPattern> {
    const hit = grids.value.get(id);
    if (hit) return hit;
    const got = await elementPatternsApi.pattern(id);
    grids.value = new Map(grids.value).set(id, got);
    return got;
  }

  /** The design with its table element's values filled in (unchanged for other elements or unknown ids). */
  async function resolve(design: DesignInput): Promise<DesignInput> {
    const e = design.element;
    if (!e || e.kind !== 'table' || e.pattern || !e.patternId) return design;
    try {
      return { ...design, element: { ...e, pattern: await grid(e.patternId) } };
    } catch {
      return design;
    }
  }

  async function upload(file: File, name: string): Promise<PatternSummary | null> {
    if (!studyId.value) return null;
    const form = new FormData();
    form.append('file', file);
    if (name.trim() !== '') form.append('name', name.trim());
    busy.value = true;
    try {
      const made = await elementPatternsApi.upload(studyId.value, form);
      grids.value = new Map(grids.value).set(made.id, made.pattern);
      await load(studyId.value);
      error.value = null;
      return made;
    } catch (err) {
      error.value = errorMessage(err);
      return null;
    } finally {
      busy.value = false;
    }
  }

  async function remove(id: string): Promise<void> {
    try {
      await elementPatternsApi.remove(id);
      if (studyId.value) await load(studyId.value);
    } catch (err) {
      error.value = errorMessage(err);
    }
  }

  return { studyId, list, grids, busy, error, load, grid, resolve, upload, remove };
});
