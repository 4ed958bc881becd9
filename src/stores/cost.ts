/**
 * The open study's cost-and-power model: load and save it through the API, and price a design with it (the
 * candidate preview uses the same pure function the sweep writer does, so both agree).
 */
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { costApi } from '@/api/cost';
import { costOfDesign, type CostDesign, type CostFigures, type CostMetrics, type CostModel, type CostModelView } from '@shared/cost/index.ts';

export const useCostStore = defineStore('cost', () => {
  const view = ref<CostModelView | null>(null);
  const studyId = computed(() => view.value?.studyId ?? null);
  const model = computed<CostModel | null>(() => view.value?.model ?? null);

  async function load(id: string): Promise<CostModelView> {
    view.value = await costApi.get(id);
    return view.value;
  }

  /** Loads only when another study's model (or none) is held. */
  async function ensure(id: string): Promise<CostModelView> {
    return view.value?.studyId === id ? view.value : load(id);
  }

  async function save(id: string, next: CostModel): Promise<CostModelView> {
    view.value = await costApi.save(id, next);
    return view.value;
  }

  /** The design's figures under the held model; null while the study has none. */
  function price(design: CostDesign, metrics: CostMetrics): CostFigures | null {
    return model.value ? costOfDesign(design, metrics, model.value) : null;
  }

  return { view, studyId, model, load, ensure, save, price };
});
