/** Part of the trade store: the designs ticked to compare (shared by the table and every chart). */
import { computed, ref, type Ref } from 'vue';
import type { TradeDesign } from '@shared/trade/trade-design.ts';

export function useSelection(rows: Ref<TradeDesign[]>) {
  const selected = ref<number[]>([]);
  const selectedRows = computed(() => {
    const set = new Set(selected.value);
    return rows.value.filter((r) => set.has(r.designIndex));
  });

  function setSelected(list: number[]): void {
    const next = [...new Set(list)].sort((a, b) => a - b);
    if (JSON.stringify(next) !== JSON.stringify(selected.value)) selected.value = next;
  }
  function toggleSelected(designIndex: number): void {
    setSelected(selected.value.includes(designIndex) ? selected.value.filter((d) => d !== designIndex) : [...selected.value, designIndex]);
  }

  return { selected, selectedRows, setSelected, toggleSelected };
}
