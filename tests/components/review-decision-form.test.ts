import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { beforeEach, describe, expect, it } from 'vitest';
import DecisionForm from '@/components/review/DecisionForm.vue';
import RfExposureEstimate from '@/components/review/RfExposureEstimate.vue';
import { RF_EXPOSURE_CAUTION } from '@shared/safety/index.ts';
import { stubMatchMedia } from '../helpers/jsdom.ts';
import type { DesignSearchHit, DesignSearchResult } from '@shared/schemas/review.ts';

beforeEach(() => {
  stubMatchMedia();
});

const design = { frequencyGHz: 28, nx: 8, ny: 1, dxMm: 5.35, channelPowerDbm: 10 };
const SWEEP_ID = '0f8fad5b-d9cb-469f-a165-70867728950e';
/** The candidate's own target sheet (not the study's first). */
const SHEET_ID = '7c9e6679-7425-40de-944b-e07fc1f90ae7';
const hits: DesignSearchHit[] = [
  { key: 'candidate:1', kind: 'candidate', design, label: 'Candidate “Edge module B”: 8×1, 5.35 mm pitch', designIndex: null, sweep: null, candidate: { id: '1', name: 'Edge module B' }, description: '8×1', targetSheetId: SHEET_ID },
  { key: `sweep:${SWEEP_ID}:33`, kind: 'sweep', design: `${SWEEP_ID}:33`, label: 'Design #33 of “Pitch sweep”: 4×1', designIndex: 33, sweep: { id: SWEEP_ID, name: 'Pitch sweep' }, candidate: null, description: '4×1', targetSheetId: null },
];

/** A fake of the server's search (what the form asked for is recorded) and of its check, failing `failed` limits. */
function fakes(failed: string[] = []) {
  const asked: string[] = [];
  const checkedAgainst: (string | undefined)[] = [];
  const search = async (q: string): Promise<DesignSearchResult> => {
    asked.push(q);
    return { hits, total: 1 };
  };
  const check = async (d: unknown, label?: string, targetSheetId?: string) =>
    (checkedAgainst.push(targetSheetId), {
      label: label ?? '?', design: d, metrics: { at: null, axis: 'az', points: [], figures: { peakEirpDbm: 24, edgeEirpDbm: 20, worstSllDb: -12, channels: 8 }, basis: 'azimuth -45° to 45°' },
      targetSheetId: 's', targetSheet: { name: 'Handset 28 GHz' }, check: null, failedLimits: failed,
    }) as never;
  return { asked, checkedAgainst, search, check };
}

const mountForm = (f = fakes()) => mount(DecisionForm, { props: { search: f.search, check: f.check }, global: { plugins: [Antd] }, attachTo: document.body });
const choose = async (w: ReturnType<typeof mountForm>, key: string) => {
  await flushPromises();
  w.findComponent({ name: 'ASelect' }).vm.$emit('update:value', key);
  await flushPromises();
};
const dialogButton = () => [...document.querySelectorAll<HTMLButtonElement>('.sign-off-dialog button')].find((b) => b.textContent?.includes('Sign off'))!;

describe('DecisionForm', () => {
  it('refuses to submit without a chosen design and says so', async () => {
    const w = mountForm();
    await w.find('form').trigger('submit');
    expect(w.emitted('submit')).toBeUndefined();
    expect(w.text()).toContain('choose the design you are signing off');
  });

  it('searches on the server as the reviewer types, and shows the shared schema rule when the rationale is empty', async () => {
    const f = fakes();
    const w = mountForm(f);
    await flushPromises();
    expect(f.asked).toEqual(['']);
    w.findComponent({ name: 'ASelect' }).vm.$emit('search', '33');
    await new Promise((r) => setTimeout(r, 250));
    await flushPromises();
    expect(f.asked).toEqual(['', '33']);
    await choose(w, 'candidate:1');
    await w.find('form').trigger('submit');
    expect(w.emitted('submit')).toBeUndefined();
    expect(w.text()).toContain('must be text of 1 to 20000 characters');
  });

  it('is not armed to sign by default: it saves a draft of a sweep design, sent by its id', async () => {
    const w = mountForm();
    await choose(w, `sweep:${SWEEP_ID}:33`);
    await w.find('[data-test="rationale"]').setValue('Draft for discussion.');
    expect((w.find('input[type="checkbox"]').element as HTMLInputElement).checked).toBe(false);
    expect(w.find('[data-test="submit"]').text()).toBe('Save draft');
    await w.find('form').trigger('submit');
    expect(w.emitted('submit')![0]![0]).toMatchObject({ design: `${SWEEP_ID}:33`, sign: false, alternatives: [] });
    // A sweep design is judged against its sweep's sheet, which the server knows from the id.
    expect(w.emitted('submit')![0]![0]).not.toHaveProperty('targetSheetId');
  });

  it('signs only after the dialog, which names the design and the limits it fails, and needs a justification then', async () => {
    const f = fakes(['maxApertureXMm']);
    const w = mountForm(f);
    await choose(w, 'candidate:1');
    await w.find('[data-test="rationale"]').setValue('Fewest channels at the edge EIRP.');
    await w.find('[data-test="add-alternative"]').trigger('click');
    await w.find('[data-test="alt-label-0"]').setValue('Edge module A');
    await w.find('[data-test="alt-reason-0"]').setValue('misses edge EIRP');
    await w.find('input[type="checkbox"]').setValue(true);
    await w.find('form').trigger('submit');
    await flushPromises();
    expect(w.emitted('submit')).toBeUndefined();
    expect(f.checkedAgainst).toEqual([SHEET_ID]); // the candidate's own sheet
    const dialog = document.querySelector('.sign-off-dialog')!;
    expect(dialog.textContent).toContain('Candidate “Edge module B”');
    expect(dialog.textContent).toContain('Fails 1 limit of Handset 28 GHz');
    expect(dialog.textContent).toContain('Max aperture x (mm)');
    expect(dialogButton().disabled).toBe(true);
    const reason = document.querySelector<HTMLTextAreaElement>('[data-test="justification"]')!;
    reason.value = 'Aperture waived for the lab build.';
    reason.dispatchEvent(new Event('input'));
    await flushPromises();
    expect(dialogButton().disabled).toBe(false);
    dialogButton().click();
    await flushPromises();
    expect(w.emitted('submit')![0]![0]).toEqual({
      design,
      label: 'Candidate “Edge module B”: 8×1, 5.35 mm pitch',
      targetSheetId: SHEET_ID,
      rationale: 'Fewest channels at the edge EIRP.',
      alternatives: [{ label: 'Edge module A', reason: 'misses edge EIRP' }],
      sign: true,
      justification: 'Aperture waived for the lab build.',
    });
    // Once the parent has recorded it, reset() clears and disarms the form.
    (w.vm as unknown as { reset(): void }).reset();
    await flushPromises();
    expect((w.find('[data-test="rationale"]').element as HTMLTextAreaElement).value).toBe('');
    expect((w.find('input[type="checkbox"]').element as HTMLInputElement).checked).toBe(false);
    w.unmount();
  });
});

describe('RfExposureEstimate', () => {
  it('shows the density at the default 1 m and 10 W/m² and always the caution', () => {
    // 60 dBm = 1000 W; at 1 m S = 1000 / (4π) = 79.577 W/m²; falls to 10 W/m² at √(1000 / 40π) = 2.821 m (hand calculation).
    const w = mount(RfExposureEstimate, { props: { eirpDbm: 60 }, global: { plugins: [Antd] } });
    expect(w.find('[data-test="density"]').text()).toBe('79.577 W/m²');
    expect(w.find('[data-test="reference-distance"]').text()).toBe('2.821 m');
    expect(w.text()).toContain(RF_EXPOSURE_CAUTION);
  });

  it('still shows the caution when there is no EIRP', () => {
    const w = mount(RfExposureEstimate, { props: { eirpDbm: null }, global: { plugins: [Antd] } });
    expect(w.text()).toContain('No EIRP for this design');
    expect(w.text()).toContain(RF_EXPOSURE_CAUTION);
  });
});
