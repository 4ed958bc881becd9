/** Devices of the open study: the list, which one is open, and saving its changes. */
import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { devicesApi } from '@/api/devices';
import type { DeviceLayoutInput } from '@shared/schemas/device.ts';
import type { DeviceRow } from '@shared/api/devices.ts';
import { errorMessage } from '@/api/errors';

export type { DeviceRow } from '@shared/api/devices.ts';

export const useDevicesStore = defineStore('devices', () => {
  const studyId = ref<string | null>(null);
  const list = ref<DeviceRow[]>([]);
  const loading = ref(false);
  const error = ref<string | null>(null);
  const selectedId = ref<string | null>(null);
  const selected = computed(() => list.value.find((d) => d.id === selectedId.value) ?? null);

  async function load(id: string): Promise<void> {
    if (studyId.value !== id) {
      list.value = [];
      selectedId.value = null;
    }
    studyId.value = id;
    loading.value = true;
    error.value = null;
    try {
      list.value = await devicesApi.list(id);
      if (!selected.value) selectedId.value = list.value[0]?.id ?? null;
    } catch (err) {
      error.value = errorMessage(err);
    } finally {
      loading.value = false;
    }
  }

  async function create(name: string, layout: DeviceLayoutInput, targetSheetId: string | null): Promise<DeviceRow> {
    if (!studyId.value) throw new Error('no study is open');
    const created = await devicesApi.create(studyId.value, { name, layout, targetSheetId });
    list.value.push(created);
    selectedId.value = created.id;
    return created;
  }

  async function save(id: string, patch: { name?: string; layout?: DeviceLayoutInput; targetSheetId?: string | null }): Promise<DeviceRow> {
    const saved = await devicesApi.save(id, patch);
    const row = list.value.find((d) => d.id === id);
    if (row) Object.assign(row, saved);
    return saved;
  }

  async function remove(id: string): Promise<void> {
    await devicesApi.remove(id);
    list.value = list.value.filter((d) => d.id !== id);
    if (selectedId.value === id) selectedId.value = list.value[0]?.id ?? null;
  }

  function select(id: string): void {
    selectedId.value = id;
  }

  return { studyId, list, loading, error, selectedId, selected, load, create, save, remove, select };
});
