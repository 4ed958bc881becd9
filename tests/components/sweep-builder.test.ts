import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import SweepsPanel from '@/components/sweep/SweepsPanel.vue';
import { pointCount } from '@/components/sweep/sweep-count';
import {
  ELEMENT_OPTIONS, NUMBER_FIELDS, TAPER_OPTIONS, buildSweep, expandRange, formKeyOfServerField, numberValues, stateFromCandidate,
} from '@/components/sweep/sweep-form';
import { formatDuration, percentDone } from '@/components/sweep/sweep-progress';
import { json, stubMatchMedia } from '../helpers/jsdom.ts';

const spec = (key: string) => NUMBER_FIELDS.find((s) => s.key === key)!;
const candidate = { frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, phaseBits: 6, element: { kind: 'cosine' as const, q: 1 }, channelPowerDbm: 10 };
const freshState = () => stateFromCandidate(candidate, 'Edge module sweep', [...TAPER_OPTIONS], [...ELEMENT_OPTIONS]);

describe('sweep-form', () => {
  it('expandRange(0, 0.3, 0.1) ends at 0.3 despite binary rounding, and (-45, 45, 15) has 7 values', () => {
    expect(expandRange(0, 0.3, 0.1)).toEqual([0, 0.1, 0.2, 0.3]);
    expect(expandRange(-45, 45, 15)).toEqual([-45, -30, -15, 0, 15, 30, 45]);
  });

  it('reads lists with commas or spaces, drops duplicates and understands "continuous" for phase bits', () => {
    expect(numberValues(spec('phaseBits'), { ...freshState().numbers.phaseBits, mode: 'list', list: '3, 4 6,continuous 4' })).toEqual({ values: [3, 4, 6, null] });
  });

  it('names the rule a field breaks', () => {
    expect(numberValues(spec('nx'), { ...freshState().numbers.nx, mode: 'list', list: '4, 7.5' })).toEqual({ error: '"7.5": must be an integer' });
    expect(numberValues(spec('dxMm'), { ...freshState().numbers.dxMm, mode: 'range', start: 6, stop: 4, step: 0.5 })).toEqual({ error: 'stop must not be less than start' });
    expect(numberValues(spec('dxMm'), { ...freshState().numbers.dxMm, mode: 'range', start: 4, stop: 6, step: 0 })).toEqual({ error: 'step must be greater than 0' });
    expect('error' in numberValues(spec('nx'), { ...freshState().numbers.nx, mode: 'list', list: 'four' })).toBe(true);
  });

  it('starts with every field fixed at the candidate, so the grid is one design at one angle', () => {
    const built = buildSweep(freshState(), TAPER_OPTIONS, ELEMENT_OPTIONS);
    expect(built.errors).toEqual({});
    expect(built.grid).toMatchObject({ frequencyGHz: 28, nx: 4, dxMm: 5.35, taperX: { kind: 'uniform' }, element: { kind: 'cosine', q: 1 } });
    expect(pointCount(built.grid, built.constraints)).toEqual({ points: 1, designs: 1, anglesPerDesign: 1 });
  });

  it('counts the cartesian product, minus what the constraints drop', () => {
    const s = freshState();
    s.numbers.nx = { ...s.numbers.nx, mode: 'list', list: '4, 8, 16' };
    s.numbers.steerAzDeg = { ...s.numbers.steerAzDeg, mode: 'range', start: 0, stop: 60, step: 15 };
    s.choices.taperX = ['uniform', 'taylor-25-4'];
    const all = buildSweep(s, TAPER_OPTIONS, ELEMENT_OPTIONS);
    // 3 sizes × 2 tapers = 6 designs, × 5 angles.
    expect(pointCount(all.grid, all.constraints)).toEqual({ points: 30, designs: 6, anglesPerDesign: 5 });
    s.constraints.maxChannels = 8;
    const capped = buildSweep(s, TAPER_OPTIONS, ELEMENT_OPTIONS);
    // 16 channels is dropped: 2 sizes × 2 tapers.
    expect(pointCount(capped.grid, capped.constraints)).toEqual({ points: 20, designs: 4, anglesPerDesign: 5 });
  });

  it('asks for at least one checked taper and a name', () => {
    const s = freshState();
    s.choices.taperY = [];
    s.name = '  ';
    const built = buildSweep(s, TAPER_OPTIONS, ELEMENT_OPTIONS);
    expect(built.grid).toBeNull();
    expect(built.errors).toMatchObject({ taperY: 'check at least one', name: 'needs a name' });
  });

  it('maps the server\'s field paths to the form fields they came from', () => {
    expect(formKeyOfServerField('grid.taperX[1].sllDb')).toBe('taperX');
    expect(formKeyOfServerField('grid')).toBe('grid');
    expect(formKeyOfServerField('constraints.maxChannels')).toBe('constraints.maxChannels');
  });

  it('words progress: percent done and time left', () => {
    expect(percentDone({ pointsDone: 1, pointsTotal: 3 })).toBe(33.3);
    expect(formatDuration(125)).toBe('2 min 05 s');
    expect(formatDuration(null)).toBe('estimating…');
  });
});

/** Stands in for the browser's EventSource; the test sends the server's "progress" events through it. */
class FakeEventSource {
  static last: FakeEventSource | null = null;
  readyState = 1;
  closed = false;
  onerror: (() => void) | null = null;
  private listeners = new Map<string, ((e: MessageEvent) => void)[]>();
  constructor(readonly url: string) {
    FakeEventSource.last = this;
  }
  addEventListener(type: string, f: (e: MessageEvent) => void) {
    this.listeners.set(type, [...(this.listeners.get(type) ?? []), f]);
  }
  emit(type: string, data: unknown) {
    for (const f of this.listeners.get(type) ?? []) f(new MessageEvent(type, { data: JSON.stringify(data) }));
  }
  close() {
    this.closed = true;
    this.readyState = 2;
  }
}

beforeEach(() => {
  stubMatchMedia();
  setActivePinia(createPinia());
});
afterEach(() => vi.unstubAllGlobals());

describe('SweepsPanel', () => {
  it('shows the point count as fields vary, marks a bad field, runs, follows progress and lists the sweep', async () => {
    const posted: unknown[] = [];
    let sweeps: unknown[] = [];
    vi.stubGlobal('EventSource', FakeEventSource);
    vi.stubGlobal('fetch', vi.fn(async (url: string, init?: RequestInit) => {
      const key = `${init?.method ?? 'GET'} ${url}`;
      if (url === '/api/auth/csrf') return json(200, { token: 't' });
      if (key === 'GET /api/studies/s1/candidates') return json(200, [{ id: 'c1', name: 'Edge module', design: candidate }]);
      if (key === 'GET /api/studies/s1/sweeps') return json(200, sweeps);
      if (key === 'GET /api/studies/s1/devices') return json(200, []);
      if (key === 'POST /api/studies/s1/sweeps') {
        posted.push(JSON.parse(String(init!.body)));
        return json(201, { id: 'w1', pointsTotal: 3 });
      }
      throw new Error(`unexpected request ${key}`);
    }));
    const w = mount(SweepsPanel, { props: { studyId: 's1' }, global: { plugins: [Antd] }, attachTo: document.body });
    await flushPromises();
    const count = () => w.find('[data-test="point-count"]').text();
    expect(count()).toContain('1 point (1 design × 1 steering angle)');

    await w.find('[data-field="nx"] input[type="radio"][value="list"]').setValue(true);
    await flushPromises();
    await w.find('#sweep-field-nx').setValue('4, 8, 16');
    await flushPromises();
    expect(count()).toMatch(/^3 points \(3 designs × 1 steering angle\)/);

    await w.find('#sweep-field-nx').setValue('4, eight');
    await flushPromises();
    expect(w.find('[data-field="nx"] .error').text()).toContain('"eight" is not a number');
    expect(w.findAll('button').find((b) => b.text() === 'Run sweep')!.attributes('disabled')).toBeDefined();

    await w.find('#sweep-field-nx').setValue('4, 8, 16');
    await flushPromises();
    await w.findAll('button').find((b) => b.text() === 'Run sweep')!.trigger('click');
    await flushPromises();
    expect(posted).toHaveLength(1);
    expect(posted[0]).toMatchObject({ name: 'Edge module sweep', grid: { nx: [4, 8, 16], frequencyGHz: 28 } });

    expect(FakeEventSource.last!.url).toBe('/api/sweeps/w1/events');
    FakeEventSource.last!.emit('progress', { status: 'running', pointsDone: 1, pointsTotal: 3, ratePerSecond: 2, etaSeconds: 1 });
    await flushPromises();
    expect(w.text()).toContain('1 of 3 points');
    expect(w.text()).toContain('rate 2.0 points/s');
    expect(w.text()).toContain('time left 1 s');

    sweeps = [{ id: 'w1', name: 'Edge module sweep', status: 'done', pointsDone: 3, pointsTotal: 3, createdAt: new Date().toISOString() }];
    FakeEventSource.last!.emit('progress', { status: 'done', pointsDone: 3, pointsTotal: 3, ratePerSecond: 2, etaSeconds: 0 });
    await flushPromises();
    expect(FakeEventSource.last!.closed).toBe(true);
    expect(w.find('.ant-table').text()).toContain('Edge module sweep');
    expect(w.find('.ant-table').text()).toContain('done');
    w.unmount();
  }, 30_000);

  it('shows the server\'s field error beside that field', async () => {
    vi.stubGlobal('EventSource', FakeEventSource);
    vi.stubGlobal('fetch', vi.fn(async (url: string, init?: RequestInit) => {
      const key = `${init?.method ?? 'GET'} ${url}`;
      if (url === '/api/auth/csrf') return json(200, { token: 't' });
      if (key === 'GET /api/studies/s1/candidates') return json(200, [{ id: 'c1', name: 'Edge module', design: candidate }]);
      if (key === 'GET /api/studies/s1/sweeps') return json(200, []);
      if (key === 'GET /api/studies/s1/devices') return json(200, []);
      if (key === 'POST /api/studies/s1/sweeps') {
        return json(400, { error: { code: 'invalid_input', message: 'grid: has 3,000,000 points; the limit is 2,000,000', fields: [{ field: 'grid.dxMm', message: 'is too fine for this server' }] } });
      }
      throw new Error(`unexpected request ${key}`);
    }));
    const w = mount(SweepsPanel, { props: { studyId: 's1' }, global: { plugins: [Antd] }, attachTo: document.body });
    await flushPromises();
    await w.findAll('button').find((b) => b.text() === 'Run sweep')!.trigger('click');
    await flushPromises();
    expect(w.find('[data-field="dxMm"] .error').text()).toContain('is too fine for this server');
    w.unmount();
  }, 30_000);
});

describe('SweepsPanel over a device', () => {
  const device = {
    id: 'd1', studyId: 's1', name: 'Phone', targetSheetId: null, notes: '', position: 0, createdAt: '', updatedAt: '',
    layout: {
      outline: { widthMm: 72, heightMm: 150, depthMm: 8 },
      modules: [
        { candidateId: 'c1', face: 'right', u: 0.5, v: 0.5, codebook: { kind: 'grid', grid: 'az -45:45:15 × el 0' } },
        { candidateId: 'c1', face: 'left', u: 0.5, v: 0.5, codebook: { kind: 'grid', grid: 'az -45:45:15 × el 0' } },
      ],
    },
  };

  it('picks the device and module, counts the variants, starts a stored sweep over the device and follows it', async () => {
    const posted: { url: string; body: unknown }[] = [];
    let answer = () => json(201, { id: 'w2', pointsTotal: 6 });
    vi.stubGlobal('EventSource', FakeEventSource);
    vi.stubGlobal('fetch', vi.fn(async (url: string, init?: RequestInit) => {
      const key = `${init?.method ?? 'GET'} ${url}`;
      if (url === '/api/auth/csrf') return json(200, { token: 't' });
      if (key === 'GET /api/studies/s1/candidates') return json(200, [{ id: 'c1', name: 'Edge module', design: candidate }]);
      if (key === 'GET /api/studies/s1/sweeps') return json(200, []);
      if (key === 'GET /api/studies/s1/devices') return json(200, [device]);
      if (key === 'POST /api/devices/d1/sweeps') {
        posted.push({ url, body: JSON.parse(String(init!.body)) });
        return answer();
      }
      throw new Error(`unexpected request ${key}`);
    }));
    const w = mount(SweepsPanel, { props: { studyId: 's1' }, global: { plugins: [Antd] }, attachTo: document.body });
    await flushPromises();
    await w.find('input[type="radio"][value="device"]').setValue(true);
    await flushPromises();
    const form = () => w.find('[data-test="device-sweep-form"]');
    expect(form().find('select[aria-label="Device to sweep"]').text()).toContain('Phone');
    expect(form().find('select[aria-label="Module to vary"]').findAll('option').map((o) => o.text())).toEqual(['M1 · right · Edge module', 'M2 · left · Edge module']);
    await form().find('select[aria-label="Module to vary"]').setValue('1');
    await form().find('input[aria-label="Values of nx (elements along x)"]').setValue('2, 4');
    await form().find('input[aria-label="Values of power per channel (dBm)"]').setValue('4 10 12');
    await flushPromises();
    expect(form().find('[data-test="variant-count"]').text()).toBe('6 variants');
    const run = () => form().findAll('button').find((b) => b.text() === 'Run device sweep')!;

    // 7 × 7 = 49 variants: over the limit, said beside the count, and the button stays off.
    await form().find('input[aria-label="Values of dx (mm)"]').setValue('4, 4.5, 5, 5.5, 6, 6.5, 7');
    await form().find('input[aria-label="Values of nx (elements along x)"]').setValue('2, 3, 4, 5, 6, 7, 8');
    await form().find('input[aria-label="Values of power per channel (dBm)"]').setValue('');
    await flushPromises();
    expect(form().find('[data-test="variant-count"]').text()).toBe('49 variants (at most 48)');
    expect(run().attributes('disabled')).toBeDefined();

    await form().find('input[aria-label="Values of dx (mm)"]').setValue('');
    await form().find('input[aria-label="Values of nx (elements along x)"]').setValue('2, 4');
    await form().find('input[aria-label="Values of power per channel (dBm)"]').setValue('4 10 12');
    await flushPromises();
    // The server's field error shows beside that field.
    answer = () => json(400, { error: { code: 'invalid_input', message: 'vary.nx: must be at most 64', fields: [{ field: 'vary.nx', message: 'must be at most 64' }] } });
    await run().trigger('click');
    await flushPromises();
    expect(form().text()).toContain('must be at most 64');

    answer = () => json(201, { id: 'w2', pointsTotal: 6 });
    await run().trigger('click');
    await flushPromises();
    expect(posted.at(-1)).toEqual({ url: '/api/devices/d1/sweeps', body: { name: 'Phone: M2 varied', moduleIndex: 1, vary: { nx: [2, 4], channelPowerDbm: [4, 10, 12] } } });
    expect(FakeEventSource.last!.url).toBe('/api/sweeps/w2/events');
    FakeEventSource.last!.emit('progress', { status: 'running', pointsDone: 2, pointsTotal: 6, ratePerSecond: 4, etaSeconds: 1 });
    await flushPromises();
    expect(w.text()).toContain('2 of 6 points');
    w.unmount();
  }, 30_000);
});

describe('optionIdOf', () => {
  it('matches a candidate taper or element to the catalogue whatever its key order, and names a new one in words', async () => {
    const { optionIdOf } = await import('../../src/components/sweep/sweep-form.ts');
    const options = [{ id: 'cos15', label: 'Cosine, q = 1.5', value: { kind: 'cosine', q: 1.5 } }];
    expect(optionIdOf(options, { q: 1.5, kind: 'cosine' }, () => 'x')).toBe('cos15');
    expect(options).toHaveLength(1);
    const added = optionIdOf(options, { kind: 'cosine', q: 1.7 }, (e) => `Cosine, q = ${e.q}`);
    expect(options.find((o) => o.id === added)?.label).toBe('Cosine, q = 1.7');
  });
});
