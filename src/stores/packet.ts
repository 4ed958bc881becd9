/** The review packet page's data. */
import { defineStore } from 'pinia';
import { ref } from 'vue';
import { packetApi } from '@/api/packet';
import { errorMessage } from '@/api/errors';
import type { Packet } from '@shared/api/packet.ts';

export const usePacketStore = defineStore('packet', () => {
  const packet = ref<Packet | null>(null);
  const error = ref<string | null>(null);

  /** Loads the packet; null when refused (the error says why). */
  async function load(studyId: string, query: string): Promise<Packet | null> {
    error.value = null;
    try {
      packet.value = await packetApi.get(studyId, query);
      return packet.value;
    } catch (err) {
      error.value = errorMessage(err);
      return null;
    }
  }

  return { packet, error, load };
});
