import { beforeEach, describe, expect, it } from 'vitest';
// The library entry, not the package main, which runs a debug self-test when imported. @types/pdf-parse
// describes the package main only, hence the cast below.
// @ts-expect-error no declaration file for the library entry
import pdfParseLib from 'pdf-parse/lib/pdf-parse.js';
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
      .send({ design: { ...EDGE_MODULE, nx: 8 }, label: 'Edge module B (8 elements)', rationale: 'Fewest channels that hold the edge EIRP.', alternatives: [{ label: 'Edge module A (6 elements)', reason: 'misses edge EIRP' }] });
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
    await api.reviewer.post(`/api/studies/${studyId}/decisions`).send({ design: { ...EDGE_MODULE, nx: 8 }, rationale: 'ok' }).expect(201);
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
