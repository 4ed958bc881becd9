/**
 * Expected status of every API route for each kind of caller. route-matrix.test.ts fails when a route
 * registered on the app has no row here (or a row names no route), so add a row with every new route.
 *
 * How a row is run: for each caller a fresh world is seeded (two teams, the fixtures below; GET rows share
 * one world across the five callers), the caller signs in (anonymous callers still hold a session and a
 * CSRF token), and the request is sent once.
 * - `path` is the route exactly as registered, params included (e.g. '/api/studies/:studyId/shares').
 *   Each `:param` is replaced by `world.ids[param]`, or by `world.ids[params[param]]` when `params` maps it.
 * - `body` is sent as JSON on POST/PUT/PATCH/DELETE. An empty body is fine for routes whose role check
 *   comes before validation: callers who pass the check then get 400.
 * - Callers: `reviewer`, `engineer`, `admin` of team A; `otherTeam` is team B's admin; ids are team A's.
 */
import { Invitation } from '../../server/entities/invitation.ts';
import { MailMessage } from '../../server/entities/mail-message.ts';
import { PasswordReset } from '../../server/entities/password-reset.ts';
import { Study } from '../../server/entities/study.ts';
import { newToken } from '../../server/auth/tokens.ts';
import type { AppContext } from '../../server/context.ts';
import { createToken } from '../../server/services/api-token-service.ts';
import { createDecision } from '../../server/services/decision-service.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { seedUser, type SeededTeam } from '../helpers/auth.ts';

export type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface MatrixRow {
  method: Method;
  path: string;
  anonymous: number;
  reviewer: number;
  engineer: number;
  admin: number;
  otherTeam: number;
  body?: unknown;
  params?: Record<string, string>;
}

export interface MatrixWorld {
  ctx: AppContext;
  team: SeededTeam;
  other: SeededTeam;
  /** Ids (and link tokens) the fixtures made, by name. */
  ids: Record<string, string>;
}

export type Fixture = (world: MatrixWorld) => Promise<Record<string, string>>;

/** Run in order for every world; each sees the ids of those before it. Append yours. */
export const fixtures: Fixture[] = [
  async function accounts({ ctx, team }) {
    const study = await ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'S-band panel', visibility: 'team' });
    const engineer = { id: team.engineer.id, email: team.engineer.email, name: team.engineer.name, role: team.engineer.role, teamId: team.team.id };
    const token = await createToken(ctx, engineer, 'matrix');
    const invite = newToken();
    const invitation = await ctx.db.getRepository(Invitation).save({
      teamId: team.team.id,
      email: 'invitee@example.test',
      role: 'engineer',
      tokenHash: invite.hash,
      invitedById: team.admin.id,
      expiresAt: new Date(Date.now() + 3600_000),
    });
    const reset = newToken();
    await ctx.db.getRepository(PasswordReset).save({ userId: team.reviewer.id, tokenHash: reset.hash, expiresAt: new Date(Date.now() + 3600_000) });
    // An invitation the admin sent: the outbox shows it to its recipient and to that admin only.
    const message = await ctx.db.getRepository(MailMessage).save({
      teamId: team.team.id,
      sentBy: team.admin.id,
      fromAddress: 'no-reply@lobewise.test',
      toAddresses: ['invitee@example.test'],
      subject: 'matrix',
      textBody: 'matrix',
      raw: 'Subject: matrix\r\n\r\nmatrix',
    });
    // A study nothing else refers to: the main one gets a signed decision below, which blocks its deletion (409).
    const spare = await ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'Spare study', visibility: 'team' });
    return {
      studyId: study.id,
      deletableStudyId: spare.id,
      tokenId: token.id,
      userId: team.reviewer.id,
      // a member nothing else refers to, so removing them is not blocked by later fixtures (sign-offs keep their author)
      memberId: (await seedUser(ctx.db, team.team.id, 'engineer')).id,
      invitationId: invitation.id,
      inviteToken: invite.token,
      resetToken: reset.token,
      messageId: message.id,
    };
  },
  async function workspace({ ctx, ids }) {
    const rows: { id: string }[] = await ctx.db.query(
      `INSERT INTO candidates (study_id, name, design) VALUES ($1, 'matrix', $2) RETURNING id`,
      [ids.studyId, JSON.stringify({ frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5, dyMm: 5 })],
    );
    const [sheet] = (await ctx.db.query(`INSERT INTO target_sheets (study_id, sheet) VALUES ($1, '{"name":"matrix"}') RETURNING id`, [ids.studyId])) as { id: string }[];
    const layout = { outline: { widthMm: 72, heightMm: 150, depthMm: 8 }, modules: [{ candidateId: rows[0]!.id, face: 'front', u: 0.5, v: 0.5, codebook: { kind: 'grid', grid: 'az 0 × el 0' } }] };
    const [device] = (await ctx.db.query(`INSERT INTO devices (study_id, name, layout) VALUES ($1, 'matrix', $2) RETURNING id`, [ids.studyId, JSON.stringify(layout)])) as { id: string }[];
    return { candidateId: rows[0]!.id, sheetId: sheet!.id, deviceId: device!.id };
  },
  async function sweeps({ ctx, ids }) {
    const insert = async (status: string) =>
      ((await ctx.db.query(
        `INSERT INTO sweeps (study_id, name, grid, status, points_total, designs_total, angles_per_design, chunks_total, engine_version)
         VALUES ($1, 'matrix', '{"frequencyGHz":28,"nx":4,"dxMm":5}', $2, 1, 1, 1, 1, 'matrix') RETURNING id`,
        [ids.studyId, status],
      )) as { id: string }[])[0]!.id;
    return { sweepId: await insert('done'), runningSweepId: await insert('running') };
  },
  async function review({ ctx, team, ids }) {
    const reviewer = { id: team.reviewer.id, email: team.reviewer.email, name: team.reviewer.name, role: team.reviewer.role, teamId: team.team.id };
    const decision = await createDecision(ctx, reviewer, ids.studyId!, {
      design: DesignSchema.parse({ frequencyGHz: 28, nx: 4, dxMm: 5, channelPowerDbm: 10 }),
      rationale: 'matrix',
      alternatives: [],
      sign: true,
    });
    const [request] = (await ctx.db.query(
      `INSERT INTO review_requests (study_id, requested_by_id, reviewer_id) VALUES ($1, $2, $3) RETURNING id`,
      [ids.studyId, team.engineer.id, team.reviewer.id],
    )) as { id: string }[];
    const [comment] = (await ctx.db.query(`INSERT INTO comments (study_id, author_id, body) VALUES ($1, $2, 'matrix') RETURNING id`, [
      ids.studyId,
      team.engineer.id,
    ])) as { id: string }[];
    return { decisionId: decision.id, reviewRequestId: request!.id, commentId: comment!.id };
  },
  async function bench({ ctx, ids }) {
    const [candidate] = (await ctx.db.query(`INSERT INTO candidates (study_id, name, design) VALUES ($1, 'bench', $2) RETURNING id`, [
      ids.studyId,
      JSON.stringify({ frequencyGHz: 28, nx: 4, dxMm: 5, phaseBits: 6, grouping: 'column' }),
    ])) as { id: string }[];
    const [upload] = (await ctx.db.query(
      `INSERT INTO range_uploads (study_id, candidate_id, beam, set_name, original_filename, raw, parsed, analysis)
       VALUES ($1, $2, '{"azDeg":0,"elDeg":0,"codes":[0,0,0,0]}', 'matrix', 'matrix.csv', $3, '{"angleDeg":[],"cuts":[]}', '{"codes":[0,0,0,0],"cuts":[]}') RETURNING id`,
      [ids.studyId, candidate!.id, Buffer.from('0,-1\n')],
    )) as { id: string }[];
    return { benchCandidateId: candidate!.id, rangeUploadId: upload!.id };
  },
  async function elementPatterns({ ctx, ids }) {
    const [row] = (await ctx.db.query(
      `INSERT INTO element_patterns (study_id, name, original_filename, raw, pattern) VALUES ($1, 'matrix', 'matrix.csv', $2, $3) RETURNING id`,
      [ids.studyId, Buffer.from('azDeg,elDeg,gainDbi\n'), JSON.stringify({ azDeg: [-90, 90], elDeg: [-90, 90], gainDbi: [0, 0, 0, 0] })],
    )) as { id: string }[];
    return { elementPatternId: row!.id };
  },
];

const open = (status: number) => ({ anonymous: status, reviewer: status, engineer: status, admin: status, otherTeam: status });
const member = (status: number) => ({ anonymous: 401, reviewer: status, engineer: status, admin: status, otherTeam: status });
const adminOnly = (status: number, otherTeam = status) => ({ anonymous: 401, reviewer: 403, engineer: 403, admin: status, otherTeam });

export const matrix: MatrixRow[] = [
  // foundation
  { method: 'GET', path: '/api/health', ...open(200) },
  { method: 'POST', path: '/api/evaluate', body: {}, ...member(400), otherTeam: 400 },
  { method: 'POST', path: '/api/coverage', body: {}, ...member(400), otherTeam: 400 },

  // auth (reachable signed out)
  { method: 'GET', path: '/api/auth/csrf', ...open(200) },
  { method: 'POST', path: '/api/auth/login', body: {}, ...open(400) },
  { method: 'POST', path: '/api/auth/logout', ...open(204) },
  { method: 'POST', path: '/api/auth/password-reset', body: {}, ...open(400) },
  { method: 'GET', path: '/api/auth/password-reset/:token', params: { token: 'resetToken' }, ...open(200) },
  { method: 'POST', path: '/api/auth/password-reset/:token', params: { token: 'resetToken' }, body: {}, ...open(400) },
  { method: 'GET', path: '/api/invitations/:token', params: { token: 'inviteToken' }, ...open(200) },
  { method: 'POST', path: '/api/invitations/:token/accept', params: { token: 'inviteToken' }, body: {}, ...open(400) },

  // me and account
  { method: 'GET', path: '/api/me', ...member(200) },
  { method: 'PATCH', path: '/api/account', body: {}, ...member(400) },
  { method: 'PUT', path: '/api/account/password', body: {}, ...member(400) },
  { method: 'GET', path: '/api/account/tokens', ...member(200) },
  { method: 'POST', path: '/api/account/tokens', body: {}, ...member(400) },
  // the token belongs to team A's engineer: anyone else's request for it is 404
  { method: 'DELETE', path: '/api/account/tokens/:tokenId', anonymous: 401, reviewer: 404, engineer: 204, admin: 404, otherTeam: 404 },

  // team
  { method: 'GET', path: '/api/team', ...member(200) },
  { method: 'PATCH', path: '/api/team/members/:userId', params: { userId: 'memberId' }, body: { role: 'reviewer' }, ...adminOnly(200, 404) },
  { method: 'DELETE', path: '/api/team/members/:userId', params: { userId: 'memberId' }, ...adminOnly(204, 404) },
  { method: 'GET', path: '/api/team/invitations', ...adminOnly(200) },
  { method: 'POST', path: '/api/team/invitations', body: {}, ...adminOnly(400) },
  { method: 'DELETE', path: '/api/team/invitations/:invitationId', ...adminOnly(204, 404) },

  // outbox
  { method: 'GET', path: '/api/outbox', ...member(200) },
  { method: 'GET', path: '/api/outbox/:messageId', anonymous: 401, reviewer: 404, engineer: 404, admin: 200, otherTeam: 404 },

  // study shares: the study is team-visible and owned by team A's engineer
  { method: 'GET', path: '/api/studies/:studyId/shares', anonymous: 401, reviewer: 403, engineer: 200, admin: 403, otherTeam: 404 },
  {
    method: 'PUT',
    path: '/api/studies/:studyId/shares',
    body: { visibility: 'team', shares: [] },
    anonymous: 401,
    reviewer: 403,
    engineer: 200,
    admin: 403,
    otherTeam: 404,
  },
  // workspace: studies, candidates, target sheets (team A's team-visible study, owned by its engineer)
  { method: 'GET', path: '/api/studies', ...member(200) },
  { method: 'POST', path: '/api/studies', body: {}, anonymous: 401, reviewer: 403, engineer: 400, admin: 400, otherTeam: 400 },
  { method: 'POST', path: '/api/studies/import', body: {}, anonymous: 401, reviewer: 403, engineer: 400, admin: 400, otherTeam: 400 },
  { method: 'GET', path: '/api/studies/:id', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'PATCH', path: '/api/studies/:id', params: { id: 'studyId' }, body: {}, anonymous: 401, reviewer: 403, engineer: 200, admin: 200, otherTeam: 404 },
  { method: 'DELETE', path: '/api/studies/:id', params: { id: 'deletableStudyId' }, anonymous: 401, reviewer: 403, engineer: 204, admin: 204, otherTeam: 404 },
  { method: 'POST', path: '/api/studies/:id/duplicate', params: { id: 'studyId' }, anonymous: 401, reviewer: 403, engineer: 201, admin: 201, otherTeam: 404 },
  { method: 'GET', path: '/api/studies/:id/export', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/studies/:id/candidates', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  {
    method: 'POST',
    path: '/api/studies/:id/candidates',
    params: { id: 'studyId' },
    body: { name: 'M', design: { frequencyGHz: 28, nx: 4, dxMm: 5 } },
    anonymous: 401,
    reviewer: 403,
    engineer: 201,
    admin: 201,
    otherTeam: 404,
  },
  { method: 'GET', path: '/api/studies/:id/cost-model', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  {
    method: 'PUT',
    path: '/api/studies/:id/cost-model',
    params: { id: 'studyId' },
    body: {
      currency: 'EUR', channelsPerChip: 8, chipPrice: 20, elementPrice: 0.5, boardPricePerMm2: 0.001, boardMarginMm: 1,
      modulePrice: 4, paEfficiency: 0.15, channelOverheadW: 0.04, chipOverheadW: 0.2, txDutyCycle: 0.5,
    },
    anonymous: 401,
    reviewer: 403,
    engineer: 200,
    admin: 200,
    otherTeam: 404,
  },
  { method: 'GET', path: '/api/studies/:id/target-sheet', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  {
    method: 'PUT',
    path: '/api/studies/:id/target-sheet',
    params: { id: 'studyId' },
    body: { preset: null, sheet: {} },
    anonymous: 401,
    reviewer: 403,
    engineer: 200,
    admin: 200,
    otherTeam: 404,
  },
  { method: 'GET', path: '/api/studies/:id/target-sheets', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'POST', path: '/api/studies/:id/target-sheets', params: { id: 'studyId' }, body: { preset: null, sheet: { name: 'Second' } }, anonymous: 401, reviewer: 403, engineer: 201, admin: 201, otherTeam: 404 },
  { method: 'GET', path: '/api/studies/:id/target-sheets/:sheetId', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'PUT', path: '/api/studies/:id/target-sheets/:sheetId', params: { id: 'studyId' }, body: { preset: null, sheet: { name: 'Renamed' } }, anonymous: 401, reviewer: 403, engineer: 200, admin: 200, otherTeam: 404 },
  { method: 'DELETE', path: '/api/studies/:id/target-sheets/:sheetId', params: { id: 'studyId' }, anonymous: 401, reviewer: 403, engineer: 204, admin: 204, otherTeam: 404 },
  { method: 'GET', path: '/api/studies/:id/devices', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  // An empty body fails validation before the study is looked up, so another team also hears 400.
  { method: 'POST', path: '/api/studies/:id/devices', params: { id: 'studyId' }, body: {}, anonymous: 401, reviewer: 403, engineer: 400, admin: 400, otherTeam: 400 },
  { method: 'GET', path: '/api/devices/:id', params: { id: 'deviceId' }, ...member(200), otherTeam: 404 },
  { method: 'PATCH', path: '/api/devices/:id', params: { id: 'deviceId' }, body: { name: 'Renamed' }, anonymous: 401, reviewer: 403, engineer: 200, admin: 200, otherTeam: 404 },
  // A stored sweep needs an engineer; the fixture's candidate has no power per channel, so one past the access check
  // hears 400 (nothing to judge) and nothing is stored.
  { method: 'POST', path: '/api/devices/:id/sweeps', params: { id: 'deviceId' }, body: { moduleIndex: 0, vary: { nx: [4] } }, anonymous: 401, reviewer: 403, engineer: 400, admin: 400, otherTeam: 404 },
  { method: 'DELETE', path: '/api/devices/:id', params: { id: 'deviceId' }, anonymous: 401, reviewer: 403, engineer: 204, admin: 204, otherTeam: 404 },
  { method: 'GET', path: '/api/candidates/:id', params: { id: 'candidateId' }, ...member(200), otherTeam: 404 },
  { method: 'PATCH', path: '/api/candidates/:id', params: { id: 'candidateId' }, body: {}, anonymous: 401, reviewer: 403, engineer: 200, admin: 200, otherTeam: 404 },
  { method: 'DELETE', path: '/api/candidates/:id', params: { id: 'candidateId' }, anonymous: 401, reviewer: 403, engineer: 204, admin: 204, otherTeam: 404 },
  { method: 'GET', path: '/api/target-presets', ...member(200) },

  // sweeps
  {
    method: 'POST',
    path: '/api/studies/:id/sweeps',
    params: { id: 'studyId' },
    body: { name: 'matrix', grid: { frequencyGHz: 28, nx: 4, dxMm: 5 } },
    anonymous: 401,
    reviewer: 403,
    engineer: 201,
    admin: 201,
    otherTeam: 404,
  },
  { method: 'GET', path: '/api/studies/:id/sweeps', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/sweeps/:id', params: { id: 'sweepId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/sweeps/:id/events', params: { id: 'sweepId' }, ...member(200), otherTeam: 404 },
  { method: 'POST', path: '/api/sweeps/:id/cancel', params: { id: 'runningSweepId' }, anonymous: 401, reviewer: 403, engineer: 200, admin: 200, otherTeam: 404 },
  { method: 'GET', path: '/api/sweeps/:id/results', params: { id: 'sweepId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/sweeps/:id/designs', params: { id: 'sweepId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/sweeps/:id/results.csv', params: { id: 'sweepId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/sweeps/:id/steer-span', params: { id: 'sweepId' }, ...member(200), otherTeam: 404 },

  // review and sign-off: the fixture study holds one signed decision, one open request to team A's reviewer, one comment
  { method: 'GET', path: '/api/studies/:id/review', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'POST', path: '/api/studies/:id/review-requests', params: { id: 'studyId' }, body: { reviewerIds: [] }, anonymous: 401, reviewer: 403, engineer: 400, admin: 400, otherTeam: 400 },
  { method: 'GET', path: '/api/review-requests/waiting', ...member(200) },
  { method: 'POST', path: '/api/studies/:id/decisions/check', params: { id: 'studyId' }, body: { design: { frequencyGHz: 28, nx: 4, dxMm: 5 } }, anonymous: 401, reviewer: 200, engineer: 403, admin: 403, otherTeam: 403 },
  { method: 'GET', path: '/api/studies/:id/design-search', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'POST', path: '/api/review-requests/:id/answer', params: { id: 'reviewRequestId' }, body: { state: 'accepted' }, anonymous: 401, reviewer: 200, engineer: 403, admin: 403, otherTeam: 403 },
  { method: 'GET', path: '/api/studies/:id/comments', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'POST', path: '/api/studies/:id/comments', params: { id: 'studyId' }, body: { body: 'matrix' }, ...member(201), otherTeam: 404 },
  { method: 'GET', path: '/api/comments/:id', params: { id: 'commentId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/studies/:id/decisions', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'POST', path: '/api/studies/:id/decisions', params: { id: 'studyId' }, body: {}, anonymous: 401, reviewer: 400, engineer: 403, admin: 403, otherTeam: 403 },
  { method: 'GET', path: '/api/decisions/:id', params: { id: 'decisionId' }, ...member(200), otherTeam: 404 },
  // signed: refused with 409 to every member, whatever their role
  { method: 'PATCH', path: '/api/decisions/:id', params: { id: 'decisionId' }, body: { rationale: 'x' }, ...member(409), otherTeam: 404 },
  { method: 'DELETE', path: '/api/decisions/:id', params: { id: 'decisionId' }, ...member(409), otherTeam: 404 },
  { method: 'GET', path: '/api/studies/:id/packet', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/studies/:id/packet.pdf', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },

  // bench codes and range data (team A's 4-column 6-bit candidate and one stored upload)
  { method: 'POST', path: '/api/candidates/:id/codes', params: { id: 'benchCandidateId' }, body: { beams: '0:0:1' }, ...member(200), otherTeam: 404 },
  // without ?beams= every signed-in caller gets the 400 first (it reveals nothing about the candidate)
  { method: 'GET', path: '/api/candidates/:id/codes.csv', params: { id: 'benchCandidateId' }, ...member(400) },
  { method: 'GET', path: '/api/candidates/:id/calibration', params: { id: 'benchCandidateId' }, ...member(200), otherTeam: 404 },
  { method: 'PUT', path: '/api/candidates/:id/calibration', params: { id: 'benchCandidateId' }, body: { offsets: [] }, anonymous: 401, reviewer: 403, engineer: 200, admin: 200, otherTeam: 404 },
  { method: 'POST', path: '/api/candidates/:id/manual-codes', params: { id: 'benchCandidateId' }, body: { codes: [0, 0, 0, 0] }, ...member(200), otherTeam: 404 },
  { method: 'POST', path: '/api/candidates/:id/squint', params: { id: 'benchCandidateId' }, body: { beam: { azDeg: 0 }, band: 'n261', points: 2 }, ...member(200), otherTeam: 404 },
  { method: 'POST', path: '/api/candidates/:id/monte-carlo', params: { id: 'benchCandidateId' }, body: { trials: 2 }, ...member(200), otherTeam: 404 },
  // a JSON body carries no file: callers allowed to upload get the 400 naming it
  { method: 'POST', path: '/api/candidates/:id/range-data', params: { id: 'benchCandidateId' }, body: { azDeg: 0 }, anonymous: 401, reviewer: 403, engineer: 400, admin: 400, otherTeam: 404 },
  { method: 'GET', path: '/api/studies/:id/range-data', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/range-data/:id', params: { id: 'rangeUploadId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/range-data/:id/raw', params: { id: 'rangeUploadId' }, ...member(200), otherTeam: 404 },
  { method: 'DELETE', path: '/api/range-data/:id', params: { id: 'rangeUploadId' }, anonymous: 401, reviewer: 403, engineer: 204, admin: 204, otherTeam: 404 },

  // element patterns (one stored 2 × 2 grid); a JSON body carries no file, so uploaders get the 400 naming it
  { method: 'POST', path: '/api/studies/:id/element-patterns', params: { id: 'studyId' }, body: {}, anonymous: 401, reviewer: 403, engineer: 400, admin: 400, otherTeam: 404 },
  { method: 'GET', path: '/api/studies/:id/element-patterns', params: { id: 'studyId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/element-patterns/:id', params: { id: 'elementPatternId' }, ...member(200), otherTeam: 404 },
  { method: 'GET', path: '/api/element-patterns/:id/raw', params: { id: 'elementPatternId' }, ...member(200), otherTeam: 404 },
  { method: 'DELETE', path: '/api/element-patterns/:id', params: { id: 'elementPatternId' }, anonymous: 401, reviewer: 403, engineer: 204, admin: 204, otherTeam: 404 },
];
