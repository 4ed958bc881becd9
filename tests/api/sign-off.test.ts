/**
 * Sign-off that records the decision the reviewer made: any design of any sweep can be found and chosen, a design that
 * fails its sheet needs a written justification, the review trail survives the sign-off, the reviewer's queue, the
 * packet's own sweep and sheet with one set of figures, and the sign-off mail over real SMTP.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { designRows, pointRow } from '../../server/sweeps/rows.ts';
import { signOffText } from '../../server/services/sign-off-mail.ts';
import { ENGINE_VERSION, evaluateDesign } from '../../shared/engine/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { evaluateRange } from '../../shared/sweep/evaluate-range.ts';
import { compileGrid } from '../../shared/sweep/grid.ts';
import { SweepGridShapeSchema } from '../../shared/sweep/grid-schema.ts';
import { HANDSET_28GHZ } from '../../shared/targets/presets.ts';
import { scanFigures } from '../../src/workers/preview-compute.ts';
import { authed, linkIn, seedTeam, seedUser } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';
import { createStudy, EDGE_MODULE } from './review-fixtures.ts';

const api = useApiTest({ mail: true, team: 'Kestrel Bay Arrays', signIn: ['engineer', 'reviewer', 'admin'] });
let studyId: string;

beforeEach(async () => {
  studyId = await createStudy(api.engineer, 'Harbor Point edge module');
  await api.engineer.put(`/api/studies/${studyId}/target-sheet`).send({ preset: HANDSET_28GHZ.id, sheet: HANDSET_28GHZ.sheet }).expect(200);
});

/** Stores a finished sweep of `gridInput` in the study, as the demo seed does; answers its id. */
async function insertFinishedSweep(name: string, gridInput: unknown, finishedAgo = '0 seconds'): Promise<string> {
  const compiled = compileGrid(SweepGridShapeSchema.parse(gridInput));
  const points = evaluateRange(compiled, 0, compiled.points);
  const [sweep] = (await api.ctx.db.query(
    `INSERT INTO sweeps (study_id, name, grid, constraints, status, points_total, points_done, points_failed, designs_total,
       angles_per_design, chunks_total, engine_version, started_at, finished_at)
     VALUES ($1, $2, $3, '{}', 'done', $4, $4, 0, $5, $6, 1, $7, now(), now() - $8::interval) RETURNING id`,
    [studyId, name, JSON.stringify(gridInput), compiled.points, compiled.designs, compiled.anglesPerDesign, ENGINE_VERSION, finishedAgo],
  )) as { id: string }[];
  const insert = (table: string, rows: unknown[]) =>
    api.ctx.db.query(`INSERT INTO ${table} SELECT * FROM jsonb_populate_recordset(NULL::${table}, $1::jsonb)`, [JSON.stringify(rows)]);
  await insert('sweep_points', points.map((p) => pointRow(sweep!.id, p)));
  await insert('sweep_designs', designRows(sweep!.id, points));
  return sweep!.id;
}

// 40 invented 28 GHz edge rows (8 sizes × 5 pitches), scanned over the handset sheet's −45…45° in azimuth.
const BIG_GRID = {
  frequencyGHz: 28,
  nx: [2, 3, 4, 5, 6, 7, 8, 9],
  ny: 1,
  dxMm: [4.8, 5, 5.2, 5.35, 5.5],
  phaseBits: 6,
  element: { kind: 'cosine', q: 1 },
  channelPowerDbm: 10,
  steerAzDeg: [-45, -15, 15, 45],
};

type Hit = { key: string; kind: string; label: string; designIndex: number | null; design: unknown; description: string };
const search = async (q: string, limit = 20) =>
  (await api.reviewer.get(`/api/studies/${studyId}/design-search`).query({ q, limit }).expect(200)).body as { hits: Hit[]; total: number };

describe('GET /api/studies/:id/design-search', () => {
  it('finds any design of any finished sweep by its number, by parameters and by a candidate name', async () => {
    const sweepId = await insertFinishedSweep('Edge rows', BIG_GRID);
    const [row33] = (await api.ctx.db.query(`SELECT nx, dx_mm, edge_eirp_dbm FROM sweep_designs WHERE sweep_id = $1 AND design_index = 33`, [sweepId])) as {
      nx: number; dx_mm: number; edge_eirp_dbm: number;
    }[];
    expect(row33).toBeDefined();

    // "33" is design #33, not a figure of 33.x; "#33" likewise. The label leads with the number and the short description.
    for (const q of ['33', '#33', 'design 33']) {
      const { hits } = await search(q);
      expect(hits.map((h) => h.key)).toEqual([`sweep:${sweepId}:33`]);
      expect(hits[0]!.design).toBe(`${sweepId}:33`);
      expect(hits[0]!.label).toMatch(new RegExp(`^Design #33 of “Edge rows”: ${row33!.nx}×1, ${row33!.dx_mm} mm pitch, uniform, 6-bit, per element`));
    }

    // By parameters: every design with that many channels (one per element here) and that pitch, nothing else.
    const byParams = await search(`${row33!.nx} ch ${row33!.dx_mm} mm`);
    expect(byParams.total).toBe(1);
    expect(byParams.hits[0]!.designIndex).toBe(33);
    const bySize = await search('4x1', 50);
    expect(bySize.total).toBe(5);
    expect(bySize.hits.every((h) => h.description.startsWith('4×1,'))).toBe(true);

    // Everything is searchable, not a top-20 by EIRP: the whole sweep is there, paged by the limit.
    expect((await search('', 50)).total).toBe(40);
    expect((await search('', 5)).hits.filter((h) => h.kind === 'sweep')).toHaveLength(5);

    // A candidate's name finds the candidate and the sweep designs with its parameters.
    const cand = await api.engineer
      .post(`/api/studies/${studyId}/candidates`)
      .send({ name: 'Edge module C', design: { ...EDGE_MODULE, nx: 4, dxMm: 5.35, taperX: { kind: 'uniform' }, element: { kind: 'cosine', q: 1 }, phaseBits: 6 } })
      .expect(201);
    const byName = await search('edge module c');
    expect(byName.hits[0]).toMatchObject({ kind: 'candidate', key: `candidate:${cand.body.id}` });
    expect(byName.hits[0]!.label).toMatch(/^Candidate “Edge module C”: 4×1, 5.35 mm pitch/);
    const sameParams = byName.hits.filter((h) => h.kind === 'sweep');
    expect(sameParams).toHaveLength(1);
    expect(sameParams[0]!.description).toMatch(/^4×1, 5.35 mm pitch/);
  });

  it("hands out a candidate's own target sheet, which the sign-off check then judges it against", async () => {
    const sheet = await api.engineer
      .post(`/api/studies/${studyId}/target-sheets`)
      .send({ preset: null, sheet: { name: 'Lab build, tiny aperture', maxApertureXMm: 5 } })
      .expect(201);
    const design = { ...EDGE_MODULE, nx: 4, dxMm: 5.35 };
    const own = await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'Lab module', design, targetSheetId: sheet.body.id }).expect(201);
    const plain = await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'Plain module', design }).expect(201);
    const hits = (await search('module')).hits as (Hit & { targetSheetId: string | null })[];
    expect(hits.find((h) => h.key === `candidate:${own.body.id}`)!.targetSheetId).toBe(sheet.body.id);
    expect(hits.find((h) => h.key === `candidate:${plain.body.id}`)!.targetSheetId).toBeNull();
    // The form sends it; the check then judges against that sheet (its 5 mm aperture limit fails a 4 × 5.35 mm row).
    const checked = await api.reviewer.post(`/api/studies/${studyId}/decisions/check`).send({ design, targetSheetId: sheet.body.id }).expect(200);
    expect(checked.body.targetSheetId).toBe(sheet.body.id);
    expect(checked.body.failedLimits).toContain('maxApertureXMm');
  });

  it('answers 400 naming the field for a bad limit and 404 for another team', async () => {
    const bad = await api.reviewer.get(`/api/studies/${studyId}/design-search`).query({ q: '3', limit: 500 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].field).toBe('query.limit');
    const outsider = await authed(api.app, (await seedTeam(api.ctx.db, 'Other Co')).reviewer);
    expect((await outsider.get(`/api/studies/${studyId}/design-search`).query({ q: '1' })).status).toBe(404);
  });
});

describe('signing a design that fails its target sheet', () => {
  it('needs a written justification naming the failed limits, and records the sheet it was judged against', async () => {
    // 8 × 5.35 mm = 42.8 mm, past the handset sheet's 22 mm aperture (presets.ts); so it fails at least that limit.
    const design = { ...EDGE_MODULE, nx: 8 };
    const refused = await api.reviewer.post(`/api/studies/${studyId}/decisions`).send({ design, rationale: 'Widest edge EIRP.' });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields[0].field).toBe('justification');
    expect(refused.body.error.message).toMatch(/maxApertureXMm/);
    expect(await api.ctx.db.query(`SELECT id FROM decisions`)).toEqual([]);

    const signed = await api.reviewer
      .post(`/api/studies/${studyId}/decisions`)
      .send({ design, rationale: 'Widest edge EIRP.', justification: 'Aperture waived for the lab build.' })
      .expect(201);
    const [sheet] = (await api.ctx.db.query(`SELECT id FROM target_sheets WHERE study_id = $1`, [studyId])) as { id: string }[];
    expect(signed.body.targetSheetId).toBe(sheet!.id);
    expect(signed.body.targetSheet.name).toBe(HANDSET_28GHZ.sheet.name);
    expect(signed.body.failedLimits).toContain('maxApertureXMm');
    expect(signed.body.check.limits.maxApertureXMm.pass).toBe(false);
    expect(signed.body.justification).toBe('Aperture waived for the lab build.');
  });

  it('a design that meets every limit signs without one', async () => {
    const sweepId = await insertFinishedSweep('Edge rows', { ...BIG_GRID, nx: [4], dxMm: [5.35] });
    const res = await api.reviewer.post(`/api/studies/${studyId}/decisions`).send({ design: `${sweepId}:0`, rationale: 'Meets the sheet.' });
    expect(res.status).toBe(201);
    expect(res.body.failedLimits).toEqual([]);
    expect(res.body.check.pass).toBe(true);
  });
});

describe('the review trail, the queue and the studies list', () => {
  it('keeps every request, answer, note and the sign-off in order after the study is signed off', async () => {
    const [request] = (await api.engineer.post(`/api/studies/${studyId}/review-requests`).send({ reviewerIds: [api.team.reviewer.id], message: 'Check the edge EIRP at 45°.' }).expect(201)).body;
    await api.reviewer.post(`/api/review-requests/${request.id}/answer`).send({ state: 'sent_back', note: 'Add a 4-element option.' }).expect(200);
    await api.reviewer.post(`/api/review-requests/${request.id}/answer`).send({ state: 'accepted', note: 'The 4-element row holds.' }).expect(200);
    const sweepId = await insertFinishedSweep('Edge rows', { ...BIG_GRID, nx: [4], dxMm: [5.35] });
    await api.reviewer.post(`/api/studies/${studyId}/decisions`).send({ design: `${sweepId}:0`, rationale: 'Fewest channels meeting the sheet.' }).expect(201);

    const review = (await api.engineer.get(`/api/studies/${studyId}/review`).expect(200)).body;
    expect(review.state).toBe('signed_off');
    expect(review.allRequests.map((r: { id: string; message: string; state: string }) => [r.id, r.message, r.state])).toEqual([[request.id, 'Check the edge EIRP at 45°.', 'accepted']]);
    expect(review.trail.map((e: { kind: string; verdict?: string }) => e.verdict ?? e.kind)).toEqual(['asked', 'sent_back', 'accepted', 'signed']);
    expect(review.trail[0].message).toBe('Check the edge EIRP at 45°.');
    expect(review.trail[1].note).toBe('Add a 4-element option.');
    expect(review.trail[3].rationale).toBe('Fewest channels meeting the sheet.');

    // The packet prints the same trail.
    const packet = (await api.engineer.get(`/api/studies/${studyId}/packet`).expect(200)).body;
    expect(packet.review.trail).toEqual(review.trail);
  });

  it("lists a reviewer's open requests with their note and the link the e-mail carries; answered ones leave the list", async () => {
    const [request] = (await api.engineer.post(`/api/studies/${studyId}/review-requests`).send({ reviewerIds: [api.team.reviewer.id], message: 'Look at the 45° edge.' }).expect(201)).body;
    const waiting = (await api.reviewer.get('/api/review-requests/waiting').expect(200)).body;
    expect(waiting).toHaveLength(1);
    expect(waiting[0]).toMatchObject({ id: request.id, message: 'Look at the 45° edge.', study: { id: studyId, name: 'Harbor Point edge module' }, requestedBy: { id: api.team.engineer.id } });
    const mail = await api.mail.latestTo(api.team.reviewer.email);
    const { url } = linkIn(mail.textBody, `/studies/${studyId}`);
    expect(new URL(url).pathname + new URL(url).search + new URL(url).hash).toBe(waiting[0].link);
    expect(mail.textBody).toContain('Look at the 45° edge.');
    expect((await api.engineer.get('/api/review-requests/waiting').expect(200)).body).toEqual([]);
    const outsider = await authed(api.app, (await seedTeam(api.ctx.db, 'Other Co')).reviewer);
    expect((await outsider.get('/api/review-requests/waiting').expect(200)).body).toEqual([]);

    await api.reviewer.post(`/api/review-requests/${request.id}/answer`).send({ state: 'accepted' }).expect(200);
    expect((await api.reviewer.get('/api/review-requests/waiting').expect(200)).body).toEqual([]);
  });

  it('shows each study’s review state and counts review activity as its last change', async () => {
    const row = async () => ((await api.engineer.get('/api/studies').expect(200)).body as { id: string; reviewState: string; lastChangeAt: string; updatedAt: string }[]).find((s) => s.id === studyId)!;
    expect((await row()).reviewState).toBe('draft');
    // Put the study's own last edit in the past, so only review activity can move "last change".
    await api.ctx.db.query(`UPDATE studies SET updated_at = now() - interval '2 days' WHERE id = $1`, [studyId]);
    const before = await row();
    expect(before.lastChangeAt).toBe(new Date(before.updatedAt).toISOString());
    const [request] = (await api.engineer.post(`/api/studies/${studyId}/review-requests`).send({ reviewerIds: [api.team.reviewer.id] }).expect(201)).body;
    const asked = await row();
    expect(asked.reviewState).toBe('in_review');
    expect(Date.parse(asked.lastChangeAt)).toBeGreaterThanOrEqual(Date.parse(request.createdAt));
    expect(Date.parse(asked.lastChangeAt) - Date.parse(before.updatedAt)).toBeGreaterThan(24 * 3600_000);
    await api.reviewer.post(`/api/review-requests/${request.id}/answer`).send({ state: 'sent_back', note: 'Needs a wider pitch option.' }).expect(200);
    const back = await row();
    expect(back.reviewState).toBe('sent_back');
    expect(Date.parse(back.lastChangeAt)).toBeGreaterThanOrEqual(Date.parse(asked.lastChangeAt));
  });
});

describe('the packet describes the decision’s own sweep and sheet with one set of figures', () => {
  it('ranks the sweep the decision chose from, not the newest, and its figures match the trade table over the sheet’s scan', async () => {
    const chosenSweep = await insertFinishedSweep('Edge rows', { ...BIG_GRID, nx: [4, 6], dxMm: [5.35] }, '1 day');
    await insertFinishedSweep('Newer pitch check', { ...BIG_GRID, nx: [3], dxMm: [5] });
    await api.reviewer.post(`/api/studies/${studyId}/decisions`).send({ design: `${chosenSweep}:0`, rationale: 'Fewest channels meeting the sheet.' }).expect(201);

    const p = (await api.engineer.get(`/api/studies/${studyId}/packet`).expect(200)).body;
    expect(p.sweepRanked.sweepId).toBe(chosenSweep);
    expect(p.sweepRanked.reason).toBe('decision');
    expect(p.targetSheet).toMatchObject({ name: HANDSET_28GHZ.sheet.name, judgedDecision: true });
    expect(p.sweepRanked.basis).toMatch(/inside the target sheet's scan range \(azimuth -45° to 45°\)/);
    expect(p.decision.metrics.basis).toMatch(/inside the target sheet's scan range/);

    // The trade table's windowed row for the same design (GET designs with the sheet's scan) is the reference.
    const table = (await api.engineer.get(`/api/sweeps/${chosenSweep}/designs`).query({ scanAz: '-45..45', designIndex: 0 }).expect(200)).body.rows[0];
    const ranked = p.sweepRanked.rows.find((r: { designIndex: number }) => r.designIndex === 0);
    for (const key of ['worstSllDb', 'edgeEirpDbm', 'peakEirpDbm', 'scanLossEdgeDb'] as const) {
      expect(p.decision.metrics.figures[key]).toBeCloseTo(table[key], 9);
      expect(ranked.figures[key]).toBeCloseTo(table[key], 9);
    }

    const pdf = await api.engineer.get(`/api/studies/${studyId}/packet.pdf`).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(pdf.status).toBe(200);
  });

  it('a candidate’s worst side-lobe level in the packet is the one the candidate page shows', async () => {
    const design = { ...EDGE_MODULE, nx: 4 };
    await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'Edge module D', design }).expect(201);
    const p = (await api.engineer.get(`/api/studies/${studyId}/packet`).expect(200)).body;
    const ranked = p.ranked.find((r: { label: string }) => r.label === 'Edge module D');
    // The candidate page's own computation (the live preview's scan over the sheet's range), run here directly.
    const parsed = DesignSchema.parse(design);
    const page = scanFigures(parsed, evaluateDesign(parsed), { scanAzDeg: HANDSET_28GHZ.sheet.scanAzDeg, scanElDeg: HANDSET_28GHZ.sheet.scanElDeg });
    expect(ranked.figures.worstSllDb).toBeCloseTo(page.figures.worstSllDb!, 12);
    expect(ranked.figures.edgeEirpDbm).toBeCloseTo(page.figures.edgeEirpDbm!, 12);
  });
});

describe('mail on sign-off', () => {
  it('mails the owner and everyone who took part, over SMTP to the fake server, each their own copy', async () => {
    const second = await seedUser(api.ctx.db, api.team.team.id, 'reviewer');
    await api.engineer.post(`/api/studies/${studyId}/review-requests`).send({ reviewerIds: [api.team.reviewer.id, second.id], message: 'Both of you, please.' }).expect(201);
    await api.admin.post(`/api/studies/${studyId}/comments`).send({ body: 'Cost looks fine.' }).expect(201);
    const sweepId = await insertFinishedSweep('Edge rows', { ...BIG_GRID, nx: [4], dxMm: [5.35] });
    const signed = await api.reviewer.post(`/api/studies/${studyId}/decisions`).send({ design: `${sweepId}:0`, rationale: 'Fewest channels meeting the sheet.' }).expect(201);

    for (const address of [api.team.engineer.email, second.email, api.team.admin.email]) {
      const mail = await api.mail.latestTo(address);
      expect(mail.subject).toBe('Signed off: “Harbor Point edge module”');
      expect(mail.textBody).toContain(`Chosen design: ${signed.body.label}`);
      expect(mail.textBody).toContain(`It meets every limit of “${HANDSET_28GHZ.sheet.name}”.`);
      expect(linkIn(mail.textBody, `/studies/${studyId}`).url).toMatch(/#review$/);
    }
    // The signer is not mailed about their own act.
    const toSigner = (await api.ctx.db.query(`SELECT subject FROM mail_messages WHERE $1 = ANY(to_addresses)`, [api.team.reviewer.email])) as { subject: string }[];
    expect(toSigner.map((m) => m.subject)).not.toContain('Signed off: “Harbor Point edge module”');
  });

  it('says which limits failed and why it was signed anyway', () => {
    const text = signOffText({ id: 's1', name: 'Kestrel panel' }, 'Rev Iewer', {
      label: 'Design #3 of “Rows”', signedAt: '2026-12-01T10:00:00.000Z', createdAt: '2026-12-01T10:00:00.000Z', failedLimits: ['maxApertureXMm'],
      justification: 'Waived.', rationale: 'Best EIRP.', targetSheet: { name: 'Handset' }, metrics: { basis: 'azimuth -45° to 45°' },
    } as never, 'http://app.test');
    expect(text).toContain('It fails these limits of “Handset”: Max aperture x (mm)');
    expect(text).toContain('Why it was signed off anyway: Waived.');
    expect(text).toContain('http://app.test/studies/s1#review');
  });
});
