import { beforeEach, describe, expect, it } from 'vitest';
// The library entry, not the package main, which runs a debug self-test when imported. @types/pdf-parse
// describes the package main only, hence the cast below.
// @ts-expect-error no declaration file for the library entry
import pdfParseLib from 'pdf-parse/lib/pdf-parse.js';
import { designRows, pointRow } from '../../server/sweeps/rows.ts';
import { ENGINE_VERSION } from '../../shared/engine/index.ts';
import { evaluateRange } from '../../shared/sweep/evaluate-range.ts';
import { compileGrid } from '../../shared/sweep/grid.ts';
import { SweepGridShapeSchema } from '../../shared/sweep/grid-schema.ts';
import { HANDSET_28GHZ } from '../../shared/targets/presets.ts';
import { authed, seedTeam, type AuthedClient } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';
import { createStudy, EDGE_MODULE } from './review-fixtures.ts';

const pdfParse = pdfParseLib as typeof import('pdf-parse');

const api = useApiTest({ team: 'Kestrel Bay Arrays', signIn: ['engineer', 'reviewer'] });
let studyId: string;

beforeEach(async () => {
  studyId = await createStudy(api.engineer, 'Harbor Point edge module');
  await api.engineer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: HANDSET_28GHZ.id, sheet: HANDSET_28GHZ.sheet }).expect(200);
  for (const [name, nx] of [['Edge module A (6 elements)', 6], ['Edge module B (8 elements)', 8]] as const) {
    await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name, design: { ...EDGE_MODULE, nx } }).expect(201);
  }
});

/** Binary body for supertest: collect the PDF bytes. */
const binary = (res: NodeJS.ReadableStream, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

async function pdfText(client: AuthedClient, query = '') {
  const res = await client.get(`/api/studies/${studyId}/packet.pdf${query}`).buffer(true).parse(binary as never);
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toMatch(/^application\/pdf/);
  const body = res.body as Buffer;
  expect(body.subarray(0, 5).toString()).toBe('%PDF-');
  const parsed = await pdfParse(body);
  // Lines may wrap anywhere; compare on single spaces.
  return { text: parsed.text.replace(/\s+/g, ' '), pages: parsed.numpages };
}

describe('GET /api/studies/:id/packet.pdf', () => {
  it('contains the study name, the chosen design, the caution, and the identity and page number on every page', async () => {
    const signed = await api.reviewer
      .post(`/api/studies/${studyId}/decisions`)
      .send({
        design: { ...EDGE_MODULE, nx: 8 },
        label: 'Edge module B (8 elements)',
        rationale: 'Fewest channels that hold the edge EIRP.',
        // 8 × 5.35 mm = 42.8 mm is past the handset sheet's 22 mm aperture, so signing needs a reason.
        justification: 'The 22 mm aperture is being renegotiated with the handset team.',
        alternatives: [{ label: 'Edge module A (6 elements)', reason: 'misses edge EIRP' }],
      });
    expect(signed.status).toBe(201);
    const { text, pages } = await pdfText(api.engineer);
    expect(text).toContain('Harbor Point edge module');
    expect(text).toContain('Chosen design: Edge module B (8 elements)');
    expect(text).toContain('Fewest channels that hold the edge EIRP.');
    expect(text).toContain('This is a far-field estimate, not a compliance assessment.');
    expect(text).toContain('Near-field and body-worn use need measurement or simulation.');
    expect(text).toContain('Local regulations and qualified RF-safety practice govern.');
    expect(text).toContain('ICNIRP (2020)');
    expect(text).toContain('Handset module, 28 GHz');
    expect(pages).toBeGreaterThanOrEqual(2);
    for (let p = 1; p <= pages; p++) expect(text).toContain(`Page ${p} of ${pages}`);
    // Header and footer each carry the study id on every page.
    expect(text.split(studyId).length - 1).toBeGreaterThanOrEqual(2 * pages);
  });

  it('still prints the caution when nothing is signed yet', async () => {
    const { text } = await pdfText(api.reviewer);
    expect(text).toContain('No decision has been signed for this study yet.');
    expect(text).toContain('This is a far-field estimate, not a compliance assessment.');
  });

  it('before any sign-off estimates exposure from the highest peak EIRP among the ranked designs', async () => {
    const res = await api.reviewer.get(`/api/studies/${studyId}/packet`).expect(200);
    const eirps = [...res.body.ranked, ...(res.body.sweepRanked?.rows ?? [])]
      .map((d: { figures: { peakEirpDbm: number | null } }) => d.figures.peakEirpDbm)
      .filter((e: number | null): e is number => typeof e === 'number');
    expect(eirps.length).toBeGreaterThan(0);
    expect(res.body.exposure.eirpDbm).toBe(Math.max(...eirps));
    expect(res.body.exposureBasis).toMatch(/highest peak EIRP among the ranked designs \(Edge module B/);
    const { text } = await pdfText(api.reviewer);
    expect(text).toContain('as no design is signed off yet');
  });

  it('answers 400 for a bad distance and 404 for another team', async () => {
    const bad = await api.engineer.get(`/api/studies/${studyId}/packet.pdf?distanceM=-1`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].field).toBe('query.distanceM');
    const outsider = await authed(api.app, (await seedTeam(api.ctx.db, 'Other Co')).engineer);
    expect((await outsider.get(`/api/studies/${studyId}/packet.pdf`)).status).toBe(404);
  });
});

describe('GET /api/studies/:id/packet', () => {
  it('ranks the candidates, charts the chosen design and estimates exposure at the asked distance', async () => {
    await api.reviewer
      .post(`/api/studies/${studyId}/decisions`)
      .send({ design: { ...EDGE_MODULE, nx: 8 }, rationale: 'ok', justification: 'Aperture limit waived for this build.' })
      .expect(201);
    const res = await api.engineer.get(`/api/studies/${studyId}/packet?distanceM=0.5&referenceWm2=10`);
    expect(res.status).toBe(200);
    const p = res.body;
    expect(p.ranked.map((r: { label: string }) => r.label).sort()).toEqual(['Edge module A (6 elements)', 'Edge module B (8 elements)']);
    expect(p.targetSheet.limits.length).toBeGreaterThan(3);
    expect(p.chart.points.length).toBeGreaterThan(2);
    // Sheet scan −45…45°: the chart spans it.
    expect(p.chart.points[0].angleDeg).toBeCloseTo(-45, 6);
    expect(p.chart.points.at(-1).angleDeg).toBeCloseTo(45, 6);
    // S = EIRP / (4π r²) at 0.5 m from the peak EIRP the packet reports.
    const eirpW = 10 ** ((p.exposure.eirpDbm - 30) / 10);
    expect(p.exposure.densityWm2).toBeCloseTo(eirpW / (4 * Math.PI * 0.25), 9);
    expect(p.exposure.distanceM).toBe(0.5);
    expect(p.caution).toMatch(/not a compliance assessment/);
  });
});

/** Stores a finished sweep of `grid` in the study, as the demo seed does; answers its id. */
async function insertFinishedSweep(name: string, gridInput: unknown): Promise<string> {
  const compiled = compileGrid(SweepGridShapeSchema.parse(gridInput));
  const points = evaluateRange(compiled, 0, compiled.points);
  const [sweep] = (await api.ctx.db.query(
    `INSERT INTO sweeps (study_id, name, grid, constraints, status, points_total, points_done, points_failed, designs_total,
       angles_per_design, chunks_total, engine_version, started_at, finished_at)
     VALUES ($1, $2, $3, '{}', 'done', $4, $4, 0, $5, $6, 1, $7, now(), now()) RETURNING id`,
    [studyId, name, JSON.stringify(gridInput), compiled.points, compiled.designs, compiled.anglesPerDesign, ENGINE_VERSION],
  )) as { id: string }[];
  const insert = (table: string, rows: unknown[]) =>
    api.ctx.db.query(`INSERT INTO ${table} SELECT * FROM jsonb_populate_recordset(NULL::${table}, $1::jsonb)`, [JSON.stringify(rows)]);
  await insert('sweep_points', points.map((p) => pointRow(sweep!.id, p)));
  await insert('sweep_designs', designRows(sweep!.id, points));
  return sweep!.id;
}

describe('the packet ranks the latest finished sweep', () => {
  // Three 28 GHz edge arrays, 1 row at 5.35 mm, scanned over the sheet's −45…45°. Against the handset sheet:
  // 6 elements are 6 × 5.35 = 32.1 mm long, past its 22 mm aperture; 2 elements at 10 dBm each fall short of its
  // 22.4 dBm peak EIRP (array estimate P + 20·log10 N + element gain ≈ 10 + 6 + 6 = 22 dBm, common practice);
  // 4 elements meet every limit by the engine's figures. Fewest channels alone would put the 2-element row first.
  const grid = { frequencyGHz: 28, nx: [2, 4, 6], ny: 1, dxMm: 5.35, phaseBits: 6, element: { kind: 'cosine', q: 1 }, channelPowerDbm: 10, steerAzDeg: [-45, 0, 45] };
  const sweepName = 'Edge row sizes at 28 GHz';

  it('lists the passing sweep design first and says how many of the sweep pass', async () => {
    // An older finished sweep that must not be the one ranked.
    await insertFinishedSweep('Older edge sweep', { ...grid, nx: [3] });
    await api.ctx.db.query(`UPDATE sweeps SET finished_at = now() - interval '1 day' WHERE study_id = $1`, [studyId]);
    const sweepId = await insertFinishedSweep(sweepName, grid);
    const index = async (nx: number) =>
      ((await api.ctx.db.query(`SELECT design_index FROM sweep_designs WHERE sweep_id = $1 AND nx = $2`, [sweepId, nx])) as { design_index: number }[])[0]!.design_index;
    const [two, four, six] = [await index(2), await index(4), await index(6)];

    const json = (await api.engineer.get(`/api/studies/${studyId}/packet`).expect(200)).body;
    expect(json.sweepRanked.sweepId).toBe(sweepId);
    expect(json.sweepRanked.designs).toBe(3);
    expect(json.sweepRanked.passing).toBe(1);
    expect(json.sweepRanked.rows.map((r: { designIndex: number; verdict: string }) => [r.designIndex, r.verdict])).toEqual([
      [four, 'pass'],
      [two, 'fail'],
      [six, 'fail'],
    ]);
    expect(json.sweepRanked.rows[0].parameters).toContain('4 × 1');
    // The candidates keep their own sub-table.
    expect(json.ranked).toHaveLength(2);

    const { text, pages } = await pdfText(api.engineer);
    expect(text).toContain(`"${sweepName}"`);
    expect(text).toContain('3 designs in the sweep, 1 passing the target sheet');
    const at = (label: string) => text.indexOf(label);
    const label = (n: number) => `Design #${n} of “${sweepName}”`;
    expect(json.sweepRanked.rows.map((r: { label: string }) => r.label)).toEqual([label(four), label(two), label(six)]);
    expect(at(label(four))).toBeGreaterThan(-1);
    expect(at(label(four))).toBeLessThan(at(label(two)));
    expect(at(label(two))).toBeLessThan(at(label(six)));
    expect(text).toContain('4 × 1, pitch 5.35 × 5.35 mm, uniform taper, 6-bit phase, element grouping');
    expect(text).not.toContain('Older edge sweep');
    expect(text).toContain('Edge module A (6 elements)');
    for (let p = 1; p <= pages; p++) expect(text).toContain(`Page ${p} of ${pages}`);
    expect(text.split(studyId).length - 1).toBeGreaterThanOrEqual(2 * pages);
  });

  it('says so when the study has no finished sweep', async () => {
    const { text } = await pdfText(api.engineer);
    expect(text).toContain('The study has no finished sweep yet.');
  });
});
