/** The outbox page: the mail list and the one message open. */
import { defineStore } from 'pinia';
import { ref } from 'vue';
import { outboxApi } from '@/api/outbox';
import { errorMessage } from '@/api/errors';
import type { MailDetail, MailRow } from '@shared/api/account.ts';

export const useOutboxStore = defineStore('outbox', () => {
  const rows = ref<MailRow[]>([]);
  const open = ref<MailDetail | null>(null);
  const error = ref<string | null>(null);
  const loading = ref(false);

  async function load(): Promise<void> {
    loading.value = true;
    try {
      rows.value = await outboxApi.list();
    } catch (err) {
      error.value = errorMessage(err);
    } finally {
      loading.value = false;
    }
  }

  /** Opens one message; false when it could not be read (the error says why). */
  async function show(row: MailRow): Promise<boolean> {
    try {
      open.value = await outboxApi.message(row.id);
      return true;
    } catch (err) {
      error.value = errorMessage(err);
      return false;
    }
  }

  return { rows, open, error, loading, load, show };
});
