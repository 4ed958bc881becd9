/**
 * Save a chart as SVG or PNG from a template ref, with a busy flag and a readable error.
 * The drawing-to-file work lives in use-chart-save.ts; this adds the component-facing state.
 */
import { ref, type Ref } from 'vue';
import { errorMessage } from '@/api/errors';
import { saveChart, type ChartFormat } from './use-chart-save.ts';

export function useChartExport(container: Ref<HTMLElement | null | undefined>, baseName: () => string) {
  const saving = ref(false);
  const error = ref<string | null>(null);

  async function save(format: ChartFormat): Promise<void> {
    if (!container.value) return;
    saving.value = true;
    error.value = null;
    try {
      await saveChart(container.value, baseName(), format);
    } catch (err) {
      error.value = errorMessage(err);
    } finally {
      saving.value = false;
    }
  }

  return { save, saving, error };
}

export type { ChartFormat };
