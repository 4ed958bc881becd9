import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { beforeEach, describe, expect, it } from 'vitest';
import DecisionForm from '@/components/review/DecisionForm.vue';
import RfExposureEstimate from '@/components/review/RfExposureEstimate.vue';
import { RF_EXPOSURE_CAUTION } from '@shared/safety/index.ts';
import { stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
});

const design = { frequencyGHz: 28, nx: 8, ny: 1, dxMm: 5.35, channelPowerDbm: 10 };
const candidates = [{ key: 'candidate:1', label: 'Edge module B', design }];
const sweepDesigns = [{ key: 'sweep:s:3', label: 'Pitch sweep #4', design: '0f8fad5b-d9cb-469f-a165-70867728950e:3' }];

const mountForm = () => mount(DecisionForm, { props: { candidates, sweepDesigns }, global: { plugins: [Antd] } });
const choose = async (w: ReturnType<typeof mountForm>, key: string) => {
  w.findComponent({ name: 'ASelect' }).vm.$emit('update:value', key);
  await flushPromises();
};

describe('DecisionForm', () => {
  it('refuses to submit without a chosen design and says so', async () => {
    const w = mountForm();
    await w.find('form').trigger('submit');
    expect(w.emitted('submit')).toBeUndefined();
    expect(w.text()).toContain('choose the design you are signing off');
  });

  it('shows the shared schema rule when the rationale is empty', async () => {
    const w = mountForm();
    await choose(w, 'candidate:1');
    await w.find('form').trigger('submit');
    expect(w.emitted('submit')).toBeUndefined();
    expect(w.text()).toContain('must be text of 1 to 20000 characters');
  });

  it('emits the candidate design, its name, the rationale, the alternatives and sign: true', async () => {
    const w = mountForm();
    await choose(w, 'candidate:1');
    await w.find('[data-test="rationale"]').setValue('Fewest channels at the edge EIRP.');
    await w.find('[data-test="add-alternative"]').trigger('click');
    await w.find('[data-test="alt-label-0"]').setValue('Edge module A');
    await w.find('[data-test="alt-reason-0"]').setValue('misses edge EIRP');
    await w.find('form').trigger('submit');
    expect(w.emitted('submit')).toHaveLength(1);
    expect(w.emitted('submit')![0]![0]).toEqual({
      design,
      label: 'Edge module B',
      rationale: 'Fewest channels at the edge EIRP.',
      alternatives: [{ label: 'Edge module A', reason: 'misses edge EIRP' }],
      sign: true,
    });
  });

  it('sends a sweep design by its id, and as a draft when "sign now" is cleared', async () => {
    const w = mountForm();
    await choose(w, 'sweep:s:3');
    await w.find('[data-test="rationale"]').setValue('Draft for discussion.');
    await w.find('input[type="checkbox"]').setValue(false);
    expect(w.find('[data-test="submit"]').text()).toBe('Save draft');
    await w.find('form').trigger('submit');
    expect(w.emitted('submit')![0]![0]).toMatchObject({ design: '0f8fad5b-d9cb-469f-a165-70867728950e:3', sign: false, alternatives: [] });
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
