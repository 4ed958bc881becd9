import type { Express } from 'express';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { AuditEvent } from '../../server/entities/audit-event.ts';
import { ENGINE_VERSION, evaluateDesign } from '../../shared/engine/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { authed, seedTeam, seedUser, type AuthedClient, type SeededTeam } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';
import { createStudy, EDGE_MODULE } from './review-fixtures.ts';

let ctx: AppContext;
let app: Express;
let t: SeededTeam;
let engineer: AuthedClient;
let reviewer: AuthedClient;
let studyId: string;

beforeAll(async () => {
  ctx = await openTestContext();
});
afterAll(async () => {
  await ctx.db.destroy();
});
beforeEach(async () => {
  await truncateAll(ctx.db);
  app = createApp(ctx);
  t = await seedTeam(ctx.db, 'Kestrel Bay Arrays');
  engineer = await authed(app, t.engineer);
  reviewer = await authed(app, t.reviewer);
  studyId = await createStudy(engineer);
});

const decide = (client: AuthedClient, body: Record<string, unknown>, sid = studyId) =>
  client.post(`/api/studies/${sid}/decisions`).send({ design: EDGE_MODULE, rationale: 'Meets the edge EIRP with the fewest channels.', ...body });

describe('POST /api/studies/:id/decisions', () => {
  it('lets a reviewer sign off, freezing the design, the engine metrics and the engine version', async () => {
    const res = await decide(reviewer, { label: 'Edge module B', alternatives: [{ label: '12 × 1 uniform', reason: 'too wide for the edge' }] });
    expect(res.status).toBe(201);
    const d = res.body;
    expect(d.status).toBe('signed');
    expect(d.signedAt).toEqual(expect.any(String));
    expect(d.label).toBe('Edge module B');
    expect(d.decidedBy).toMatchObject({ id: t.reviewer.id });
    expect(d.engineVersion).toBe(ENGINE_VERSION);
    expect(d.alternatives).toEqual([{ label: '12 × 1 uniform', reason: 'too wide for the edge' }]);
    // The frozen metrics are the engine's own answer for the parsed design at its steering.
    const parsed = DesignSchema.parse(EDGE_MODULE);
    expect(d.design).toEqual(parsed);
    expect(d.metrics.at).toEqual(JSON.parse(JSON.stringify(evaluateDesign(parsed))));
    expect(d.metrics.points.length).toBeGreaterThan(1);
    const steers = d.metrics.points.map((p: { steerAzDeg: number }) => p.steerAzDeg);
    expect(new Set(steers).size).toBe(steers.length);
    const audited = await ctx.db.getRepository(AuditEvent).findOneBy({ action: 'decision.signed', targetId: d.id });
    expect(audited?.actorId).toBe(t.reviewer.id);
  });

  it('refuses engineers and admins with 403: sign-off is for reviewers', async () => {
    expect((await decide(engineer, {})).status).toBe(403);
    const admin = await authed(app, t.admin);
    const res = await decide(admin, {});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    expect(await ctx.db.query(`SELECT id FROM decisions`)).toEqual([]);
  });

  it('answers 400 naming the field for a missing rationale or a bad design', async () => {
    const noRationale = await reviewer.post(`/api/studies/${studyId}/decisions`).send({ design: EDGE_MODULE });
    expect(noRationale.status).toBe(400);
    expect(noRationale.body.error.fields.map((f: { field: string }) => f.field)).toContain('rationale');
    const badDesign = await decide(reviewer, { design: { ...EDGE_MODULE, nx: 0 } });
    expect(badDesign.status).toBe(400);
    expect(badDesign.body.error.message).toMatch(/^design\.nx: /);
  });

  it('answers 404 for a sweep design id that is not in the study, 400 for one that is malformed', async () => {
    const res = await decide(reviewer, { design: '00000000-0000-4000-8000-000000000000:0' });
    expect(res.status).toBe(404);
    expect(res.body.error.message).toMatch(/sweep design/);
    const bad = await decide(reviewer, { design: 'not-an-id' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].field).toBe('design');
  });

  it('resolves a sweep design id to its parameters and per-angle metrics and freezes them', async () => {
    // A one-design sweep written straight into the sweeps tables: three steering angles evaluated by the engine.
    const [sweep] = await ctx.db.query(
      `INSERT INTO sweeps (study_id, name, grid, points_total, designs_total, angles_per_design, chunks_total, engine_version, status)
       VALUES ($1, 'Pitch sweep', '{}', 3, 1, 3, 1, $2, 'done') RETURNING id`,
      [studyId, ENGINE_VERSION],
    );
    const params = DesignSchema.parse(EDGE_MODULE);
    const angles = [0, 20, 40];
    for (const [i, az] of angles.entries()) {
      const design = { ...params, steerAzDeg: az };
      await ctx.db.query(
        `INSERT INTO sweep_points (sweep_id, point_index, design_index, angle_index, design, metrics) VALUES ($1, $2, 0, $2, $3, $4)`,
        [sweep.id, i, JSON.stringify(design), JSON.stringify(evaluateDesign(design))],
      );
    }
    await ctx.db.query(`INSERT INTO sweep_designs (sweep_id, design_index, design, angles, points_failed) VALUES ($1, 0, $2, 3, 0)`, [
      sweep.id,
      JSON.stringify(params),
    ]);
    const res = await decide(reviewer, { design: `${sweep.id}:0` });
    expect(res.status).toBe(201);
    expect(res.body.source).toBe(`${sweep.id}:0`);
    expect(res.body.label).toMatch(/^Pitch sweep #1/);
    expect(res.body.metrics.points.map((p: { steerAzDeg: number }) => p.steerAzDeg)).toEqual(angles);
    expect(res.body.metrics.points[2].metrics.scanLossDb).toBeCloseTo(evaluateDesign({ ...params, steerAzDeg: 40 }).scanLossDb, 12);
    // Deleting the sweep later leaves the signed record intact.
    await ctx.db.query(`DELETE FROM sweeps WHERE id = $1`, [sweep.id]);
    const history = await reviewer.get(`/api/studies/${studyId}/decisions`);
    expect(history.body[0].metrics.points).toHaveLength(3);
  });

  it('answers 404 to a reviewer of another team', async () => {
    const other = await seedTeam(ctx.db, 'Other Co');
    const outsider = await authed(app, other.reviewer);
    expect((await decide(outsider, {})).status).toBe(404);
    const mine = (await decide(reviewer, {})).body;
    expect((await outsider.get(`/api/decisions/${mine.id}`)).status).toBe(404);
    expect((await outsider.patch(`/api/decisions/${mine.id}`).send({ rationale: 'x' })).status).toBe(404);
  });
});

describe('decision history', () => {
  it('a later decision supersedes the earlier one and the history shows both', async () => {
    const first = (await decide(reviewer, { label: 'First choice' })).body;
    const second = (await decide(reviewer, { label: 'Second choice', design: { ...EDGE_MODULE, nx: 10 } })).body;
    expect(second.supersedesId).toBe(first.id);
    const history = await engineer.get(`/api/studies/${studyId}/decisions`);
    expect(history.status).toBe(200);
    const byId = new Map(history.body.map((d: { id: string }) => [d.id, d]));
    expect(byId.get(first.id)).toMatchObject({ status: 'superseded', supersededById: second.id, label: 'First choice' });
    expect(byId.get(second.id)).toMatchObject({ status: 'signed', supersededById: null });
    const third = (await decide(reviewer, { label: 'Third' })).body;
    expect(third.supersedesId).toBe(second.id);
  });
});

describe('a signed decision cannot change', () => {
  let signed: { id: string; rationale: string };
  beforeEach(async () => {
    signed = (await decide(reviewer, {})).body;
  });

  it('PATCH answers 409 with a clear message, for the signer and for anyone else', async () => {
    for (const client of [reviewer, engineer]) {
      const res = await client.patch(`/api/decisions/${signed.id}`).send({ rationale: 'rewritten later' });
      expect(res.status).toBe(409);
      expect(res.body.error.message).toMatch(/is signed and cannot be changed or deleted/);
    }
    const [row] = await ctx.db.query(`SELECT rationale FROM decisions WHERE id = $1`, [signed.id]);
    expect(row.rationale).toBe(signed.rationale);
  });

  it('DELETE answers 409 and the row stays', async () => {
    const res = await reviewer.delete(`/api/decisions/${signed.id}`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
    expect(await ctx.db.query(`SELECT id FROM decisions WHERE id = $1`, [signed.id])).toHaveLength(1);
  });

  it('direct SQL UPDATE and DELETE as the application database user are refused by the trigger', async () => {
    // The test DataSource connects as the application role, which is not a superuser.
    const [who] = await ctx.db.query(`SELECT current_user AS name, rolsuper FROM pg_roles WHERE rolname = current_user`);
    expect(who.rolsuper).toBe(false);
    await expect(ctx.db.query(`UPDATE decisions SET rationale = 'edited in SQL' WHERE id = $1`, [signed.id])).rejects.toThrow(/is signed/);
    await expect(ctx.db.query(`UPDATE decisions SET signed_at = NULL WHERE id = $1`, [signed.id])).rejects.toThrow(/is signed/);
    await expect(ctx.db.query(`UPDATE decisions SET metrics = '{}'::jsonb`)).rejects.toThrow(/is signed/);
    await expect(ctx.db.query(`DELETE FROM decisions WHERE id = $1`, [signed.id])).rejects.toThrow(/is signed/);
    const [row] = await ctx.db.query(`SELECT rationale, signed_at FROM decisions WHERE id = $1`, [signed.id]);
    expect(row.rationale).toBe(signed.rationale);
    expect(row.signed_at).not.toBeNull();
  });

  it('the study cannot be deleted while it holds decisions (409, not 500)', async () => {
    const admin = await authed(app, t.admin);
    const res = await admin.delete(`/api/studies/${studyId}`);
    expect(res.status).toBe(409);
    expect(await ctx.db.query(`SELECT id FROM studies WHERE id = $1`, [studyId])).toHaveLength(1);
  });

  it('TRUNCATE still empties the table (maintenance and test resets)', async () => {
    await ctx.db.query(`TRUNCATE decisions`);
    expect(await ctx.db.query(`SELECT id FROM decisions`)).toEqual([]);
  });
});

describe('draft decisions', () => {
  it('a draft can be edited and deleted by its author only, and becomes immutable once signed', async () => {
    const draft = (await decide(reviewer, { sign: false })).body;
    expect(draft.status).toBe('draft');
    const otherReviewer = await authed(app, await seedUser(ctx.db, t.team.id, 'reviewer'));
    expect((await otherReviewer.patch(`/api/decisions/${draft.id}`).send({ rationale: 'mine now' })).status).toBe(403);
    const edited = await reviewer.patch(`/api/decisions/${draft.id}`).send({ rationale: 'Tightened after the thermal review.' });
    expect(edited.status).toBe(200);
    expect(edited.body.rationale).toBe('Tightened after the thermal review.');
    const signed = await reviewer.patch(`/api/decisions/${draft.id}`).send({ sign: true });
    expect(signed.status).toBe(200);
    expect(signed.body.status).toBe('signed');
    expect((await reviewer.patch(`/api/decisions/${draft.id}`).send({ rationale: 'again' })).status).toBe(409);
    expect((await reviewer.delete(`/api/decisions/${draft.id}`)).status).toBe(409);
  });

  it('a draft can be deleted', async () => {
    const draft = (await decide(reviewer, { sign: false })).body;
    expect((await reviewer.delete(`/api/decisions/${draft.id}`)).status).toBe(204);
    expect(await ctx.db.query(`SELECT id FROM decisions`)).toEqual([]);
  });
});
