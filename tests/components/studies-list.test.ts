import { flushPromises, mount } from '@vue/test-utils';
import { describe, expect, it, vi } from 'vitest';
import StudiesGrid from '@/components/study/StudiesGrid.vue';
import { studiesColumns } from '@/components/study/studies-columns';
import { FIT_TO_CONTENT, listColumns } from '@/components/study/studies-list-columns';
import type { StudyRow } from '@/stores/studies';

vi.setConfig({ testTimeout: 30_000 });

const row: StudyRow = {
  id: 's1', name: 'Handset module with a rather long name that a fixed column would cut off', description: '', visibility: 'team', ownerId: 'u1',
  ownerName: 'Ada Engineer', targetSheetPreset: null, targetSheetName: 'Handset 28 GHz, power class 3, with margins for the plastic cover',
  candidateCount: 3, sweepCount: 1, archivedAt: null, createdAt: '2025-01-01T10:00:00Z', updatedAt: '2025-01-02T10:00:00Z', sharedWith: [],
};

describe('the studies list', () => {
  it('sizes name, owner and target sheet to their content (no flex share) and gives every cell its text as a tooltip', () => {
    const cols = listColumns(studiesColumns());
    for (const id of FIT_TO_CONTENT) {
      const c = cols.find((x) => x.colId === id)!;
      expect(c.flex, id).toBeUndefined();
      expect(c.maxWidth, id).toBeGreaterThan(300);
    }
    const sheet = cols.find((c) => c.colId === 'targetSheet')!;
    const tip = (sheet.tooltip as (p: never) => unknown)({ value: row.targetSheetName, valueFormatted: null, data: row } as never);
    expect(tip).toBe(row.targetSheetName);
  });

  it('opens a study on a single click of its name; a click on another cell only selects', async () => {
    const w = mount(StudiesGrid, { props: { rows: [row], loading: false }, attachTo: document.body });
    await vi.waitFor(() => expect(document.querySelector('.study-name')).not.toBeNull(), { timeout: 10_000 });
    (document.querySelector('.study-name') as HTMLElement).click();
    await flushPromises();
    // AG Grid hands cell clicks to the page after the event, not during it.
    await vi.waitFor(() => expect(w.emitted('open')?.[0]?.[0]).toMatchObject({ id: 's1' }), { timeout: 5_000 });
    (document.querySelector('[col-id="owner"].ag-cell') as HTMLElement).click();
    await new Promise((r) => setTimeout(r, 500));
    expect(w.emitted('open')).toHaveLength(1);
    w.unmount();
  });
});
