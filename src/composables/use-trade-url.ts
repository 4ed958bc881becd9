/**
 * Keeps the trade view (sweep, sort, filters, ticked designs, picked point) in the URL query and opens the study's
 * trade store from it, so a reload or a shared link shows the same view. Used by the trade table and the charts.
 */
import { ref, watch } from 'vue';
import { useRoute, useRouter } from 'vue-router';
import { useTradeStore } from '@/stores/trade';
import { readTradeUrl, tradeUrlQuery } from '@/components/trade/trade-url';
import { patchQuery } from './use-url-query';

export function useTradeUrl(studyId: () => string) {
  const route = useRoute();
  const router = useRouter();
  const store = useTradeStore();
  /** False while the store opens from the URL, so its empty start never overwrites the link being opened. */
  const ready = ref(false);

  async function open(force: boolean): Promise<void> {
    ready.value = false;
    if (force || store.studyId !== studyId()) await store.load(studyId(), readTradeUrl(route.query));
    ready.value = true;
  }

  function write(): void {
    if (!ready.value || store.studyId !== studyId() || !store.sweepId) return;
    const p = store.pickedPoint;
    patchQuery(
      router,
      tradeUrlQuery({
        sweepId: store.sweepId,
        view: store.view,
        selected: store.selected,
        point: p ? { designIndex: p.designIndex, index: p.index } : null,
      }),
    );
  }

  watch(() => [ready.value, store.sweepId, store.view, store.selected, store.pickedPoint], write);
  return { open, ready };
}
