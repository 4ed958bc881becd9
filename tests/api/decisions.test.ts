import { beforeEach, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/entities/audit-event.ts';
import { ENGINE_VERSION, evaluateDesign } from '../../shared/engine/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { authed, seedTeam, seedUser, type AuthedClient } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';
import { createStudy, EDGE_MODULE } from './review-fixtures.ts';

const api = useApiTest({ team: 'Kestrel Bay Arrays', signIn: ['engineer', 'reviewer'] });
let studyId: string;

beforeEach(async () => {
  studyId = await createStudy(api.engineer);
});

const decide = (client: AuthedClient, body: Record<string, unknown>, sid = studyId) =>
  client.post(`/api/studies/${sid}/decisions`).send({ design: EDGE_MODULE, rationale: 'Meets the edge EIRP with the fewest channels.', ...body });

describe('POST /api/studies/:id/decisions', () => {
  it('lets a reviewer sign off, freezing the design, the engine metrics and the engine version', async () => {
    // A sheet with only a scan range: the decision is then judged at every steering angle over it.
    const sheet = await api.engineer.post(`/api/studies/${studyId}/target-sheets`).send({ preset: null, sheet: { name: 'Edge scan', scanAzDeg: { min: -30, max: 30 } } });
    expect(sheet.status, JSON.stringify(sheet.body)).toBe(201);
    const res = await decide(api.reviewer, { label: 'Edge module B', alternatives: [{ label: '12 × 1 uniform', reason: 'too wide for the edge' }] });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const d = res.body;
    expect(d.status).toBe('signed');
    expect(d.signedAt).toEqual(expect.any(String));
    expect(d.label).toBe('Edge module B');
    expect(d.decidedBy).toMatchObject({ id: api.team.reviewer.id });
    expect(d.engineVersion).toBe(ENGINE_VERSION);
    expect(d.alternatives).toEqual([{ label: '12 × 1 uniform', reason: 'too wide for the edge' }]);
    // The frozen metrics are the engine's own answer for the parsed design at its steering.
    const parsed = DesignSchema.parse(EDGE_MODULE);
    expect(d.design).toEqual(parsed);
    expect(d.metrics.at).toEqual(JSON.parse(JSON.stringify(evaluateDesign(parsed))));
    expect(d.metrics.points.length).toBeGreaterThan(1);
    expect(d.targetSheetId).toBe(sheet.body.id);
    const steers = d.metrics.points.map((p: { steerAzDeg: number }) => p.steerAzDeg);
    expect(new Set(steers).size).toBe(steers.length);
    const audited = await api.ctx.db.getRepository(AuditEvent).findOneBy({ action: 'decision.signed', targetId: d.id });
    expect(audited?.actorId).toBe(api.team.reviewer.id);
  });

  it('refuses engineers and admins with 403: sign-off is for reviewers', async () => {
    expect((await decide(api.engineer, {})).status).toBe(403);
    const admin = await authed(api.app, api.team.admin);
    const res = await decide(admin, {});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    expect(await api.ctx.db.query(`SELECT id FROM decisions`)).toEqual([]);
  });

  it('answers 400 naming the field for a missing rationale or a bad design', async () => {
    const noRationale = await api.reviewer.post(`/api/studies/${studyId}/decisions`).send({ design: EDGE_MODULE });
    expect(noRationale.status).toBe(400);
    expect(noRationale.body.error.fields.map((f: { field: string }) => f.field)).toContain('rationale');
    const badDesign = await decide(api.reviewer, { design: { ...EDGE_MODULE, nx: 0 } });
    expect(badDesign.status).toBe(400);
    expect(badDesign.body.error.message).toMatch(/^design\.nx: /);
  });

  it('answers 404 for a sweep design id that is not in the study, 400 for one that is malformed', async () => {
    const res = await decide(api.reviewer, { design: '00000000-0000-4000-8000-000000000000:0' });
    expect(res.status).toBe(404);
    expect(res.body.error.message).toMatch(/sweep design/);
    const bad = await decide(api.reviewer, { design: 'not-an-id' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].field).toBe('design');
  });

  it('resolves a sweep design id to its parameters and per-angle metrics and freezes them', async () => {
    // A one-design sweep written straight into the sweeps tables: three steering angles evaluated by the engine.
    const [sweep] = await api.ctx.db.query(
      `INSERT INTO sweeps (study_id, name, grid, points_total, designs_total, angles_per_design, chunks_total, engine_version, status)
       VALUES ($1, 'Pitch sweep', '{}', 3, 1, 3, 1, $2, 'done') RETURNING id`,
      [studyId, ENGINE_VERSION],
    );
    const params = DesignSchema.parse(EDGE_MODULE);
    const angles = [0, 20, 40];
    for (const [i, az] of angles.entries()) {
      const design = { ...params, steerAzDeg: az };
      await api.ctx.db.query(
        `INSERT INTO sweep_points (sweep_id, point_index, design_index, angle_index, design, metrics) VALUES ($1, $2, 0, $2, $3, $4)`,
        [sweep.id, i, JSON.stringify(design), JSON.stringify(evaluateDesign(design))],
      );
    }
    await api.ctx.db.query(`INSERT INTO sweep_designs (sweep_id, design_index, design, angles, points_failed) VALUES ($1, 0, $2, 3, 0)`, [
      sweep.id,
      JSON.stringify(params),
    ]);
    const res = await decide(api.reviewer, { design: `${sweep.id}:0` });
    expect(res.status).toBe(201);
    expect(res.body.source).toBe(`${sweep.id}:0`);
    expect(res.body.label).toMatch(/^Design #0 of “Pitch sweep”: 8×1, 5.35 mm pitch/);
    expect(res.body.metrics.points.map((p: { steerAzDeg: number }) => p.steerAzDeg)).toEqual(angles);
    expect(res.body.metrics.points[2].metrics.scanLossDb).toBeCloseTo(evaluateDesign({ ...params, steerAzDeg: 40 }).scanLossDb, 12);
    // Deleting the sweep later leaves the signed record intact.
    await api.ctx.db.query(`DELETE FROM sweeps WHERE id = $1`, [sweep.id]);
    const history = await api.reviewer.get(`/api/studies/${studyId}/decisions`);
    expect(history.body[0].metrics.points).toHaveLength(3);
  });

  it('answers 404 to a reviewer of another team', async () => {
    const other = await seedTeam(api.ctx.db, 'Other Co');
    const outsider = await authed(api.app, other.reviewer);
    expect((await decide(outsider, {})).status).toBe(404);
    const mine = (await decide(api.reviewer, {})).body;
    expect((await outsider.get(`/api/decisions/${mine.id}`)).status).toBe(404);
    expect((await outsider.patch(`/api/decisions/${mine.id}`).send({ rationale: 'x' })).status).toBe(404);
  });
});

describe('decision history', () => {
  it('a later decision supersedes the earlier one and the history shows both', async () => {
    const first = (await decide(api.reviewer, { label: 'First choice' })).body;
    const second = (await decide(api.reviewer, { label: 'Second choice', design: { ...EDGE_MODULE, nx: 10 } })).body;
    expect(second.supersedesId).toBe(first.id);
    const history = await api.engineer.get(`/api/studies/${studyId}/decisions`);
    expect(history.status).toBe(200);
    const byId = new Map(history.body.map((d: { id: string }) => [d.id, d]));
    expect(byId.get(first.id)).toMatchObject({ status: 'superseded', supersededById: second.id, label: 'First choice' });
    expect(byId.get(second.id)).toMatchObject({ status: 'signed', supersededById: null });
    const third = (await decide(api.reviewer, { label: 'Third' })).body;
    expect(third.supersedesId).toBe(second.id);
  });
});

describe('a signed decision cannot change', () => {
  let signed: { id: string; rationale: string };
  beforeEach(async () => {
    signed = (await decide(api.reviewer, {})).body;
  });

  it('PATCH answers 409 with a clear message, for the signer and for anyone else', async () => {
    for (const client of [api.reviewer, api.engineer]) {
      const res = await client.patch(`/api/decisions/${signed.id}`).send({ rationale: 'rewritten later' });
      expect(res.status).toBe(409);
      expect(res.body.error.message).toMatch(/is signed and cannot be changed or deleted/);
    }
    const [row] = await api.ctx.db.query(`SELECT rationale FROM decisions WHERE id = $1`, [signed.id]);
    expect(row.rationale).toBe(signed.rationale);
  });

  it('DELETE answers 409 and the row stays', async () => {
    const res = await api.reviewer.delete(`/api/decisions/${signed.id}`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
    expect(await api.ctx.db.query(`SELECT id FROM decisions WHERE id = $1`, [signed.id])).toHaveLength(1);
  });

  it('direct SQL UPDATE and DELETE as the application database user are refused by the trigger', async () => {
    // The test DataSource connects as the application role, which is not a superuser.
    const [who] = await api.ctx.db.query(`SELECT current_user AS name, rolsuper FROM pg_roles WHERE rolname = current_user`);
    expect(who.rolsuper).toBe(false);
    await expect(api.ctx.db.query(`UPDATE decisions SET rationale = 'edited in SQL' WHERE id = $1`, [signed.id])).rejects.toThrow(/is signed/);
    await expect(api.ctx.db.query(`UPDATE decisions SET signed_at = NULL WHERE id = $1`, [signed.id])).rejects.toThrow(/is signed/);
    await expect(api.ctx.db.query(`UPDATE decisions SET metrics = '{}'::jsonb`)).rejects.toThrow(/is signed/);
    await expect(api.ctx.db.query(`DELETE FROM decisions WHERE id = $1`, [signed.id])).rejects.toThrow(/is signed/);
    const [row] = await api.ctx.db.query(`SELECT rationale, signed_at FROM decisions WHERE id = $1`, [signed.id]);
    expect(row.rationale).toBe(signed.rationale);
    expect(row.signed_at).not.toBeNull();
  });

  it('the study cannot be deleted while it holds decisions (409, not 500)', async () => {
    const admin = await authed(api.app, api.team.admin);
    const res = await admin.delete(`/api/studies/${studyId}`);
    expect(res.status).toBe(409);
    expect(await api.ctx.db.query(`SELECT id FROM studies WHERE id = $1`, [studyId])).toHaveLength(1);
  });

  it('TRUNCATE still empties the table (maintenance and test resets)', async () => {
    await api.ctx.db.query(`TRUNCATE decisions`);
    expect(await api.ctx.db.query(`SELECT id FROM decisions`)).toEqual([]);
  });
});

describe('draft decisions', () => {
  it('a draft can be edited and deleted by its author only, and becomes immutable once signed', async () => {
    const draft = (await decide(api.reviewer, { sign: false })).body;
    expect(draft.status).toBe('draft');
    const otherReviewer = await authed(api.app, await seedUser(api.ctx.db, api.team.team.id, 'reviewer'));
    expect((await otherReviewer.patch(`/api/decisions/${draft.id}`).send({ rationale: 'mine now' })).status).toBe(403);
    const edited = await api.reviewer.patch(`/api/decisions/${draft.id}`).send({ rationale: 'Tightened after the thermal review.' });
    expect(edited.status).toBe(200);
    expect(edited.body.rationale).toBe('Tightened after the thermal review.');
    const signed = await api.reviewer.patch(`/api/decisions/${draft.id}`).send({ sign: true });
    expect(signed.status).toBe(200);
    expect(signed.body.status).toBe('signed');
    expect((await api.reviewer.patch(`/api/decisions/${draft.id}`).send({ rationale: 'again' })).status).toBe(409);
    expect((await api.reviewer.delete(`/api/decisions/${draft.id}`)).status).toBe(409);
  });

  it('a draft can be deleted', async () => {
    const draft = (await decide(api.reviewer, { sign: false })).body;
    expect((await api.reviewer.delete(`/api/decisions/${draft.id}`)).status).toBe(204);
    expect(await api.ctx.db.query(`SELECT id FROM decisions`)).toEqual([]);
  });
});
