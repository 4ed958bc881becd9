import { describe, expect, it, beforeEach } from 'vitest';
import { ElementPatternRow } from '../../server/entities/element-pattern.ts';
import { resolveElementPatterns } from '../../server/services/element-pattern-service.ts';
import { useApiTest } from '../helpers/app.ts';
import { demoPatchPattern, patternCsv } from '../../shared/patterns/demo-patch-pattern.ts';
import { evaluateDesign } from '../../shared/engine/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';

const api = useApiTest({ appPerFile: true, signIn: ['engineer', 'reviewer', 'outsider'] });
let studyId: string;
const count = () => api.ctx.db.getRepository(ElementPatternRow).count();
const CSV = Buffer.from(patternCsv(demoPatchPattern(5)));

beforeEach(async () => {
  studyId = (await api.engineer.post('/api/studies').send({ name: 'Patch element' })).body.id;
});

const upload = (file: Buffer, name = 'patch.csv', client = api.engineer) => client.post(`/api/studies/${studyId}/element-patterns`).field('name', 'Patch A').attach('file', file, name);

describe('element patterns', () => {
  it('stores a pattern uploaded with its rows in any order, lists it, returns its grid and its raw file', async () => {
    const lines = CSV.toString().trim().split('\n');
    const shuffled = [lines[0]!, ...lines.slice(1).reverse()].join('\n');
    const res = await upload(Buffer.from(shuffled));
    expect(res.status).toBe(201);
    expect(res.body.azStepDeg).toBe(5);
    expect(res.body.pattern.azDeg[0]).toBe(-180);
    const list = await api.engineer.get(`/api/studies/${studyId}/element-patterns`);
    expect(list.body.patterns.map((p: { name: string }) => p.name)).toEqual(['Patch A']);
    const one = await api.reviewer.get(`/api/element-patterns/${res.body.id}`);
    expect(one.body.pattern.gainDbi).toEqual(demoPatchPattern(5).gainDbi);
    const raw = await api.engineer.get(`/api/element-patterns/${res.body.id}/raw`);
    expect(raw.text).toBe(shuffled);
    expect((await api.outsider.get(`/api/element-patterns/${res.body.id}`)).status).toBe(404);
  });

  it('refuses a bad file with a 400 naming the first bad line, and stores nothing', async () => {
    const lines = CSV.toString().trim().split('\n');
    const cases: [string, RegExp][] = [
      [[lines[0], ...lines.slice(1, 40), '7.5,0,3', ...lines.slice(40)].join('\n'), /^file: line 41: azDeg 7\.5 is off the regular grid/],
      [[lines[0], ...lines.slice(1, 10), lines[5], ...lines.slice(10)].join('\n'), /^file: line 11: repeats the grid point/],
      [['az,el,gain', ...lines.slice(1)].join('\n'), /^file: line 1: the first line must be the header azDeg,elDeg,gainDbi/],
      [[lines[0], ...lines.slice(1, 20), '0,0,abc'].join('\n'), /^file: line 21: column 3/],
      [[lines[0], ...lines.slice(1).filter((l) => Number(l.split(',')[0]) >= -60)].join('\n'), /azDeg must cover at least -90 to 90/],
    ];
    for (const [text, message] of cases) {
      const res = await upload(Buffer.from(text));
      expect(res.status, text.slice(0, 40)).toBe(400);
      expect(res.body.error.message).toMatch(message);
    }
    expect((await upload(Buffer.from(CSV), 'x.csv', api.reviewer)).status).toBe(403);
    expect(await count()).toBe(0);
  });

  it('resolves designs naming a pattern by id: the engine then sees the stored values; a stranger id is a 400 naming the field', async () => {
    const id = (await upload(CSV)).body.id as string;
    const design = { frequencyGHz: 28, nx: 4, ny: 2, dxMm: 5.35, steerAzDeg: 30, element: { kind: 'table', patternId: id } };
    const [resolved] = await resolveElementPatterns(api.ctx, { studyId }, [DesignSchema.parse(design)]);
    const direct = evaluateDesign(DesignSchema.parse({ ...design, element: { kind: 'table', patternId: id, pattern: demoPatchPattern(5) } }));
    expect(evaluateDesign(resolved!).gainAtSteerDbi).toBe(direct.gainAtSteerDbi);
    const other = (await api.engineer.post('/api/studies').send({ name: 'Elsewhere' })).body.id as string;
    await expect(resolveElementPatterns(api.ctx, { studyId: other }, [DesignSchema.parse(design)], (i) => `[${i}].element.patternId`)).rejects.toMatchObject({
      status: 400,
      message: '[0].element.patternId: must be the id of an element pattern uploaded to this study',
    });
  });

  it('a sweep over a table element stores the resolved grid (the pattern travels to the workers); an unknown id in a list is a 400 naming it', async () => {
    const id = (await upload(CSV)).body.id as string;
    const res = await api.engineer.post(`/api/studies/${studyId}/sweeps`).send({ name: 'patch sweep', grid: { frequencyGHz: 28, nx: 4, dxMm: 5.35, steerAzDeg: [0, 30], element: { kind: 'table', patternId: id } } });
    expect(res.status).toBe(201);
    const [row] = (await api.ctx.db.query(`SELECT grid FROM sweeps WHERE id = $1`, [res.body.id])) as { grid: { element: { pattern: { gainDbi: number[] } } } }[];
    expect(row!.grid.element.pattern.gainDbi).toEqual(demoPatchPattern(5).gainDbi);
    const bad = await api.engineer.post(`/api/studies/${studyId}/sweeps`).send({ name: 'bad', grid: { frequencyGHz: 28, nx: 4, dxMm: 5.35, element: [{ kind: 'isotropic' }, { kind: 'table', patternId: '00000000-0000-4000-8000-000000000000' }] } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/^grid\.element\[1\]\.patternId: /);
  });

  it('POST /api/evaluate resolves a table element by id for any study the caller may read; a stranger id is a 400 naming it', async () => {
    const id = (await upload(CSV)).body.id as string;
    const design = { frequencyGHz: 28, nx: 4, dxMm: 5.35, steerAzDeg: 30, channelPowerDbm: 10, element: { kind: 'table', patternId: id } };
    const res = await api.reviewer.post('/api/evaluate').send([design, { ...design, element: { kind: 'isotropic' } }]);
    expect(res.status).toBe(200);
    const direct = evaluateDesign(DesignSchema.parse({ ...design, element: { kind: 'table', patternId: id, pattern: demoPatchPattern(5) } }));
    expect(res.body[0].gainAtSteerDbi).toBeCloseTo(direct.gainAtSteerDbi!, 9);
    expect(res.body[0].eirpAtSteerDbm).toBeCloseTo(direct.eirpAtSteerDbm!, 9);
    const outsider = await api.outsider.post('/api/evaluate').send(design);
    expect(outsider.status).toBe(400);
    expect(outsider.body.error.message).toBe('element.patternId: must be the id of an element pattern uploaded to this study');
    const listed = await api.engineer.post('/api/evaluate').send([{ ...design, element: { kind: 'isotropic' } }, { ...design, element: { kind: 'table', patternId: 'not-an-id' } }]);
    expect(listed.status).toBe(400);
    expect(listed.body.error.message).toMatch(/^\[1\]\.element\.patternId: /);
  });
});
