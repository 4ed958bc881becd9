/** The signed-in member's open review requests: the studies page's "waiting for me" list and the header's count. */
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { reviewApi } from '@/api/review';
import type { WaitingRequest } from '@shared/schemas/review.ts';
import { errorMessage } from '@/api/errors';

export type { WaitingRequest };

export const useReviewQueueStore = defineStore('review-queue', () => {
  const waiting = ref<WaitingRequest[]>([]);
  const loaded = ref(false);
  const error = ref<string | null>(null);
  const count = computed(() => waiting.value.length);

  async function refresh(): Promise<void> {
    try {
      waiting.value = await reviewApi.waiting();
      loaded.value = true;
      error.value = null;
    } catch (err) {
      error.value = errorMessage(err);
    }
  }

  function dehydrate(): void {
    waiting.value = [];
    loaded.value = false;
  }

  return { waiting, loaded, error, count, refresh, dehydrate };
});
