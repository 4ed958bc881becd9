import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import CandidateList from '@/components/candidate/CandidateList.vue';
import type { CandidateRow } from '@/stores/candidates';
import { stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
});
vi.setConfig({ testTimeout: 30_000 });

const rows = [
  { id: 'a', name: 'First', design: { frequencyGHz: 28, nx: 4, dxMm: 5.35 } },
  { id: 'b', name: 'Panel 8×8', design: { frequencyGHz: 39, nx: 8, ny: 8, dxMm: 3.85, phaseBits: 6 } },
] as unknown as CandidateRow[];

const mountList = (selectedId: string | null) =>
  mount(CandidateList, { props: { candidates: rows, selectedId, overlayIds: [], canEdit: true, loading: false }, global: { plugins: [Antd] } });

async function open(w: ReturnType<typeof mountList>) {
  await w.findAll('button').find((b) => b.text() === 'Add candidate')!.trigger('click');
}
async function addNamed(w: ReturnType<typeof mountList>, name: string, from?: 'defaults' | 'copy') {
  if (!w.find('form.add').exists()) await open(w);
  if (from) await w.find(`input[type="radio"][value="${from}"]`).setValue(true);
  await w.find('input[aria-label="New candidate name"]').setValue(name);
  await w.find('form.add').trigger('submit');
  return w.emitted('add')!.at(-1)!;
}

describe('adding a candidate', () => {
  it('offers a copy of the selected candidate (not the first), and copies its design', async () => {
    const w = mountList('b');
    await open(w);
    expect(w.text()).toContain('copy of Panel 8×8');
    const [name, design] = await addNamed(w, 'Panel, 5-bit', 'copy');
    expect(name).toBe('Panel, 5-bit');
    expect(design).toEqual(rows[1]!.design);
    expect(design).not.toBe(rows[1]!.design); // a copy, not the same object
  });

  it('starts from the defaults when chosen', async () => {
    const w = mountList('b');
    const [, design] = await addNamed(w, 'Fresh', 'defaults');
    expect(design).toBeUndefined();
  });

  it('with nothing selected, only the defaults can be chosen', async () => {
    const w = mountList(null);
    await open(w);
    expect(w.find('input[type="radio"][value="copy"]').attributes('disabled')).toBeDefined();
    const [, design] = await addNamed(w, 'Fresh');
    expect(design).toBeUndefined();
  });
});
