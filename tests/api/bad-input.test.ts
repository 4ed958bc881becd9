/**
 * Bad input on every API route registered on the app: malformed and oversized bodies, wrong types, huge
 * numbers, NaN and Infinity, negative counts, empty and over-long strings, unknown fields, wrong content
 * types, bad query values and path params that are not ids. Each must answer a 4xx JSON error naming the
 * field at fault, never a 500, and leave every table exactly as it was.
 *
 * Routes come from the router stack, so a new route is covered by the generic cases at once; give it a
 * valid body in BODIES (or mark it NO_BODY) for the field-by-field cases.
 */
import { randomUUID } from 'node:crypto';
import type { Express } from 'express';
import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { seedTeam, signIn, type Agent } from '../helpers/auth.ts';
import {
  fieldCases, genericBodyCases, multipartCases, paramCases, RANGE_CSV, runCase,
  type BodySpec, type Case, type Method, type Outcome, type Role,
} from '../helpers/bad-input.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';
import { listRoutes } from '../helpers/routes.ts';
import { fixtures, matrix, type MatrixWorld } from './route-matrix.ts';

/** A design the engine accepts, used wherever a route takes one. */
const DESIGN = {
  frequencyGHz: 28,
  nx: 4,
  ny: 2,
  dxMm: 5.35,
  taperX: { kind: 'taylor', sllDb: 25, nbar: 4 },
  phaseBits: 6,
  element: { kind: 'cosine', q: 1.5 },
  steerAzDeg: 10,
  channelPowerDbm: 10,
};

/** A device layout on the fixture candidate: one grid module and one fill module. */
const DEVICE_LAYOUT = (ids: Record<string, string>) => ({
  outline: { widthMm: 72, heightMm: 150, depthMm: 8 },
  modules: [
    { candidateId: ids.candidateId, face: 'right', u: 0.5, v: 0.7, codebook: { kind: 'grid', grid: 'az -45:45:15 × el 0' } },
    { candidateId: ids.candidateId, face: 'left', u: 0.5, v: 0.3, codebook: { kind: 'fill', crossoverDb: 3, azMinDeg: -60, azMaxDeg: 60, elMinDeg: -30, elMaxDeg: 30 } },
  ],
});

/** A valid body per state-changing route; every leaf is then spoiled one at a time. */
const BODIES: Record<string, BodySpec> = {
  'POST /api/evaluate': { body: () => ({ ...DESIGN }) },
  'POST /api/coverage': {
    body: () => ({
      modules: [{ design: { ...DESIGN, steerAzDeg: 0 }, orientation: 'front', beams: [{ azDeg: -20, elDeg: 0 }, { azDeg: 20, elDeg: 0 }] }],
      region: { kind: 'sector', azMinDeg: -30, azMaxDeg: 30, elMinDeg: -10, elMaxDeg: 10 },
      percentiles: [50],
      stepDeg: 2,
    }),
  },
  'POST /api/auth/login': { body: () => ({ email: 'nobody@example.test', password: 'not-the-password' }) },
  'POST /api/auth/password-reset': { body: () => ({ email: 'nobody@example.test' }) },
  'POST /api/auth/password-reset/:token': { body: () => ({ password: 'a-new-password-0123' }) },
  'POST /api/invitations/:token/accept': { body: () => ({ name: 'New Person', password: 'a-new-password-0123' }) },
  'PATCH /api/account': { body: () => ({ name: 'Renamed Person' }) },
  'PUT /api/account/password': { body: () => ({ currentPassword: 'wrong-current-0123', newPassword: 'a-new-password-0123' }) },
  'POST /api/account/tokens': { body: () => ({ name: 'ci script' }) },
  'PATCH /api/team/members/:userId': { body: () => ({ role: 'engineer' }) },
  'POST /api/team/invitations': { body: () => ({ email: 'new.member@example.test', role: 'engineer' }) },
  'PUT /api/studies/:studyId/shares': { body: (ids) => ({ visibility: 'team', shares: [{ userId: ids.reviewerId, access: 'viewer' }] }) },
  'POST /api/studies': { body: () => ({ name: 'Spoilt study', description: 'd', visibility: 'team' }), allowEmpty: ['description'] },
  'POST /api/studies/import': {
    body: () => ({ format: 'lobewise-study', version: 1, study: { name: 'Imported', description: 'd' }, candidates: [{ name: 'c', design: { ...DESIGN }, notes: 'n' }] }),
    allowEmpty: ['study.description', 'candidates[0].notes'],
    allowUnknown: true,
  },
  'PATCH /api/studies/:id': { body: () => ({ name: 'Renamed', description: 'd', archived: false }), allowEmpty: ['description'] },
  'POST /api/studies/:id/candidates': { body: () => ({ name: 'Spoilt candidate', design: { ...DESIGN }, notes: 'n' }), allowEmpty: ['notes'] },
  'PATCH /api/candidates/:id': { body: () => ({ name: 'Renamed', design: { ...DESIGN }, notes: 'n', position: 1 }), allowEmpty: ['notes'] },
  'PUT /api/studies/:id/cost-model': {
    body: () => ({
      currency: 'EUR', channelsPerChip: 8, chipPrice: 20, elementPrice: 0.5, boardPricePerMm2: 0.001, boardMarginMm: 1,
      modulePrice: 4, paEfficiency: 0.15, channelOverheadW: 0.04, chipOverheadW: 0.2, txDutyCycle: 0.5,
    }),
  },
  'PUT /api/studies/:id/target-sheet': {
    body: () => ({
      preset: null,
      sheet: { name: 'Sheet', maxApertureXMm: 40, maxChannels: 16, scanAzDeg: { min: -45, max: 45 }, minPeakEirpDbm: 22, maxSllDb: -13, noGratingLobeInScan: true },
    }),
    allowEmpty: ['sheet.name'],
  },
  'POST /api/studies/:id/devices': {
    body: (ids) => ({ name: 'Phone', notes: 'n', targetSheetId: ids.sheetId, layout: DEVICE_LAYOUT(ids) }),
    allowEmpty: ['notes'],
  },
  'POST /api/devices/:id/sweeps': { body: () => ({ name: 'Spoilt device sweep', moduleIndex: 0, vary: { nx: [4, 6], channelPowerDbm: [10] } }) },
  'PATCH /api/devices/:id': { body: (ids) => ({ name: 'Phone 2', notes: 'n', layout: DEVICE_LAYOUT(ids) }), allowEmpty: ['notes'] },
  'POST /api/studies/:id/target-sheets': {
    body: () => ({ preset: null, sheet: { name: 'Small cell', minSectorEirpDbm: 43, serviceSector: { azMinDeg: -50, azMaxDeg: 50, elMinDeg: -10, elMaxDeg: 10 } } }),
    allowEmpty: ['sheet.name'],
  },
  'PUT /api/studies/:id/target-sheets/:sheetId': {
    body: () => ({ preset: 'handset-28ghz', sheet: { name: 'Handset', band: 'n257', minPeakEirpDbm: 22.4, minCoverageP50EirpDbm: 11.5 } }),
    allowEmpty: ['sheet.name'],
  },
  'POST /api/studies/:id/sweeps': {
    body: () => ({ name: 'Spoilt sweep', grid: { frequencyGHz: 28, nx: [4, 8], dxMm: 5.35, steerAzDeg: [0, 30] }, constraints: { maxChannels: 64, maxApertureXMm: 100 } }),
  },
  'POST /api/studies/:id/comments': { body: () => ({ body: 'Looks fine', target: { kind: 'study' }, mentions: [] }) },
  'POST /api/studies/:id/review-requests': { body: (ids) => ({ reviewerIds: [ids.reviewerId], message: 'please look' }), allowEmpty: ['message'] },
  'POST /api/review-requests/:id/answer': { body: () => ({ state: 'accepted', note: 'ok' }), allowEmpty: ['note'] },
  'POST /api/studies/:id/decisions': {
    body: () => ({ design: { ...DESIGN }, label: 'Choice', rationale: 'Because', alternatives: [{ label: 'Other', reason: 'r' }], sign: false }),
    allowEmpty: ['alternatives[0].reason'],
  },
  'PATCH /api/decisions/:id': { body: () => ({ label: 'Choice 2', rationale: 'Because 2' }) },
  'POST /api/studies/:id/decisions/check': { body: () => ({ design: { ...DESIGN }, label: 'Choice' }) },
  'POST /api/candidates/:id/codes': { body: () => ({ beams: '-30:30:15', pointingThresholdDeg: 2, calibration: 'none' }) },
  'POST /api/candidates/:id/manual-codes': { body: () => ({ codes: [0, 1, 2, 3, 4, 5, 6, 7], calibration: 'none' }) },
  'POST /api/candidates/:id/squint': { body: () => ({ beam: { azDeg: 20, elDeg: 0 }, band: 'n257', points: 11, calibration: 'none' }) },
  'POST /api/candidates/:id/monte-carlo': {
    body: () => ({ beam: { azDeg: 0, elDeg: 0 }, trials: 10, seed: 1, amplitudeSigmaDb: 0.5, phaseSigmaDeg: 5, failedElements: 0 }),
  },
  'PUT /api/candidates/:id/calibration': { body: () => ({ offsets: [{ channel: 1, gainDb: 0.5, phaseDeg: 3 }] }) },
};

/** Routes that take no body: only cases that fail before the handler are sent (parser, path params). */
const NO_BODY = new Set(['POST /api/auth/logout', 'POST /api/studies/:id/duplicate', 'POST /api/sweeps/:id/cancel']);

/** Routes that take a multipart form (a CSV in field `file`) and their valid text fields. */
const MULTIPART: Record<string, { fields: Record<string, string>; numeric: string[] }> = {
  'POST /api/candidates/:id/range-data': { fields: { azDeg: '0', elDeg: '0', setName: 'Set A' }, numeric: ['azDeg', 'elDeg'] },
  'POST /api/studies/:id/element-patterns': { fields: { name: 'Patch A' }, numeric: [] },
};

/** Bad query strings per GET route. */
const results = ['limit=-1', 'limit=1e999', 'limit=NaN', 'limit=100001', 'offset=-5', 'offset=99999999999999999999', 'sort=zz:asc', 'sort=nx:sideways',
  'filter[zz]=1', 'filter[nx]=abc', 'filter[nx]=9..1', 'filter[nx]=0.5..1.5', 'filter[designIndex]=0.5', 'filters={bad', 'filters=[1]', 'filters={"nx":{"min":"x"}}', 'zz=1', 'designIndex=-1'];
const QUERIES: Record<string, string[]> = {
  'GET /api/studies': ['archived=maybe', 'archived=1'],
  'GET /api/sweeps/:id/designs': results,
  'GET /api/sweeps/:id/results': results,
  'GET /api/sweeps/:id/steer-span': ['zz=1', 'offset=0'],
  // Over-long beams: 15,000 characters, as Node refuses request lines over 16 KiB before the app sees them.
  'GET /api/candidates/:id/codes.csv': ['beams=', `beams=${'9:'.repeat(7_500)}`, 'beams=-30:30:15&threshold=NaN', 'beams=-30:30:15&threshold=1e999',
    'beams=-30:30:15&threshold=-1', 'beams=-30:30:15&calibration=zz'],
  'GET /api/studies/:id/packet': ['distanceM=-1', 'distanceM=NaN', 'distanceM=1e999', 'distanceM=abc', 'referenceWm2=0', 'referenceWm2=1e308'],
  'GET /api/studies/:id/packet.pdf': ['distanceM=-1', 'distanceM=Infinity', 'referenceWm2=abc'],
  'GET /api/studies/:id/design-search': ['limit=0', 'limit=51', 'limit=abc', `q=${'x'.repeat(201)}`, 'zz=1'],
};

/**
 * Failures known today, each with its cause; they still run, and a rule that no longer matches any
 * failure fails the test so it is removed once the route is fixed. route '*' matches every route.
 */
const KNOWN: { route: string; label: string | RegExp; why: string }[] = [];
const knownRule = (o: { route: string; label: string }) =>
  KNOWN.find((k) => (k.route === '*' || k.route === o.route) && (typeof k.label === 'string' ? k.label === o.label : k.label.test(o.label)));

/** Who must send the requests of a route (the one who made the resource) when the role check alone does not tell. */
const ROLE_OF: Record<string, 'engineer' | 'admin' | 'reviewer'> = {
  'PATCH /api/decisions/:id': 'reviewer',
  'DELETE /api/decisions/:id': 'reviewer',
};

// ---- the world: two teams, the route matrix's fixtures, and one of each resource made through the API ----

let ctx: AppContext;
let app: Express;
let world: MatrixWorld;
const ids: Record<string, string> = {};
const agents = {} as Record<Role, { agent: Agent; csrf: string }>;
let tables: string[] = [];

const RESOURCE_ID: Record<string, string> = {
  studies: 'studyId',
  candidates: 'candidateId',
  devices: 'deviceId',
  sweeps: 'sweepId',
  comments: 'commentId',
  decisions: 'decisionId',
  'review-requests': 'reviewRequestId',
  'range-data': 'rangeDataId',
};

function fillPath(route: string): string {
  const [, path] = route.split(' ') as [string, string];
  const row = matrix.find((r) => `${r.method} ${r.path}` === route);
  return path.replace(/:(\w+)/g, (_m, name: string, offset: number) => {
    const mapped = row?.params?.[name];
    if (mapped && ids[mapped]) return encodeURIComponent(ids[mapped]!);
    if (name === 'token') return encodeURIComponent(path.includes('/invitations/') ? ids.inviteToken! : ids.resetToken!);
    if (name !== 'id' && ids[name]) return encodeURIComponent(ids[name]!);
    const resource = path.slice(0, offset).split('/').filter(Boolean).pop() ?? '';
    return ids[RESOURCE_ID[resource] ?? ''] ?? randomUUID();
  });
}

async function must(res: request.Response, what: string): Promise<Record<string, string>> {
  if (res.status >= 300) throw new Error(`${what} answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body as Record<string, string>;
}

async function makeResources(): Promise<void> {
  const as = (role: Role) => ({
    post: (p: string) => agents[role].agent.post(p).set('x-csrf-token', agents[role].csrf),
  });
  const study = ids.studyId!;
  // A candidate with phase bits, so the bench routes (codes, range data) accept it.
  ids.candidateId = (await must(await as('engineer').post(`/api/studies/${study}/candidates`).send({ name: 'fixture', design: DESIGN }), 'candidate')).id!;
  ids.deviceId = (await must(await as('engineer').post(`/api/studies/${study}/devices`).send({ name: 'fixture', layout: DEVICE_LAYOUT(ids) }), 'device')).id!;
  ids.sheetId = (await must(await as('engineer').post(`/api/studies/${study}/target-sheets`).send({ preset: null, sheet: { name: 'fixture' } }), 'target sheet')).id!;
  ids.sweepId = (await must(await as('engineer').post(`/api/studies/${study}/sweeps`).send({ name: 'fixture', grid: { frequencyGHz: 28, nx: 4, dxMm: 5.35 } }), 'sweep')).id!;
  ids.commentId = (await must(await as('engineer').post(`/api/studies/${study}/comments`).send({ body: 'fixture' }), 'comment')).id!;
  ids.reviewRequestId = (await must(await as('engineer').post(`/api/studies/${study}/review-requests`).send({ reviewerIds: [world.team.reviewer.id] }), 'review request')).id!;
  ids.decisionId = (await must(await as('reviewer').post(`/api/studies/${study}/decisions`).send({ design: DESIGN, rationale: 'draft', sign: false }), 'decision')).id!;
  const upload = await as('engineer').post(`/api/candidates/${ids.candidateId}/range-data`).field('azDeg', '0').attach('file', RANGE_CSV, 'fixture.csv');
  ids.rangeDataId = (await must(upload, 'range data')).id!;
}

beforeAll(async () => {
  ctx = await openTestContext();
  await truncateAll(ctx.db);
  world = { ctx, team: await seedTeam(ctx.db, 'Team A'), other: await seedTeam(ctx.db, 'Team B'), ids: {} };
  for (const fixture of fixtures) Object.assign(world.ids, await fixture(world));
  Object.assign(ids, world.ids, { reviewerId: world.team.reviewer.id });
  app = createApp(ctx);
  for (const role of ['engineer', 'admin', 'reviewer'] as const) agents[role] = await signIn(app, world.team[role]);
  await makeResources();
  const rows = (await ctx.db.query(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`)) as { tablename: string }[];
  // Sessions are touched by every signed-in request; they are not what a bad request may write.
  tables = rows.map((r) => r.tablename).filter((t) => t !== 'sessions' && t !== 'migrations');
});
afterAll(async () => {
  await ctx?.db.destroy();
});

// ---- running a case ----

const isPublic = (route: string) => {
  const row = matrix.find((r) => `${r.method} ${r.path}` === route);
  return row ? row.anonymous !== 401 : /^\S+ \/api\/(auth|invitations|health)\b/.test(route);
};

/** The role that gets past the route's role check (the first that is not refused with 403). */
async function roleFor(route: string, method: Method, path: string): Promise<Role> {
  const params = paramCases(route.split(' ')[1]!);
  for (const role of ['engineer', 'admin', 'reviewer'] as const) {
    const { agent, csrf } = agents[role];
    let req = agent[method](params[0]?.path ?? path);
    if (method !== 'get') req = req.set('x-csrf-token', csrf);
    if (!params[0] && method !== 'get' && method !== 'delete' && !NO_BODY.has(route)) req = req.send({ zzUnknown: 1 });
    if (!params[0] && (method === 'delete' || NO_BODY.has(route))) return 'engineer';
    if ((await req).status !== 403) return role;
  }
  return 'engineer';
}

function casesFor(route: string, uploadLimit: number): { label: string; field: string; send?: Case['send']; path?: string }[] {
  const [method, path] = route.split(' ') as [string, string];
  const out: { label: string; field: string; send?: Case['send']; path?: string }[] = paramCases(path).map((p) => ({ ...p }));
  if (method === 'GET') {
    for (const q of QUERIES[route] ?? []) out.push({ label: `?${q.length > 60 ? `${q.slice(0, 40)}… (${q.length} characters)` : q}`, field: `query.${q.split('&').pop()!.split(/[=[]/)[0]}`, path: `${fillPath(route)}?${q}` });
    return out;
  }
  if (method === 'DELETE') return out;
  const generic = genericBodyCases(ctx.config.BODY_LIMIT);
  if (NO_BODY.has(route)) return [...out, ...generic.filter((c) => c.label === 'malformed JSON' || c.label.startsWith('JSON body over'))];
  if (MULTIPART[route]) return [...out, ...multipartCases(MULTIPART[route]!, uploadLimit)];
  const spec = BODIES[route];
  return [...out, ...generic, ...(spec ? fieldCases(spec, ids) : [])];
}

describe('bad input on every route', () => {
  const routes = () => listRoutes(createApp(ctx)).filter((r) => r.split(' ')[1]!.startsWith('/api/'));

  it('knows a body for every state-changing route (or that it takes none)', () => {
    const registered = routes();
    const missing = registered.filter((r) => /^(POST|PUT|PATCH) /.test(r) && !BODIES[r] && !NO_BODY.has(r) && !MULTIPART[r]);
    expect(missing, 'add a valid body to BODIES in tests/api/bad-input.test.ts (or the route to NO_BODY / MULTIPART)').toEqual([]);
    const stale = [...Object.keys(BODIES), ...NO_BODY, ...Object.keys(MULTIPART), ...Object.keys(QUERIES)].filter((r) => !registered.includes(r));
    expect(stale, 'entries naming no registered route').toEqual([]);
  });

  it('answers every bad request with a 4xx JSON error naming the field, and writes nothing', { timeout: 600_000 }, async () => {
    const found: Outcome[] = [];
    let sent = 0;
    for (const route of routes()) {
      const method = route.split(' ')[0]!.toLowerCase() as Method;
      const path = fillPath(route);
      const role = ROLE_OF[route] ?? (isPublic(route) ? 'engineer' : await roleFor(route, method, path));
      for (const c of casesFor(route, ctx.config.UPLOAD_LIMIT_BYTES)) {
        sent++;
        const outcome = await runCase({ ctx, agents, tables, isPublic }, route, method, c.path ?? path, role, c);
        if (outcome) found.push(outcome);
      }
    }
    const unexpected = found.filter((o) => !knownRule(o)).map((o) => `${o.route} | ${o.label}: ${o.problem}`);
    const fixed = KNOWN.filter((k) => !found.some((o) => knownRule(o) === k)).map((k) => `${k.route} | ${String(k.label)}: ${k.why}`);
    for (const k of KNOWN) {
      const hits = found.filter((o) => knownRule(o) === k);
      if (hits.length > 0) console.warn(`known (${hits.length}): ${k.why}\n  ${hits.map((o) => `${o.route} | ${o.label}: ${o.problem}`).join('\n  ')}`);
    }
    expect(sent).toBeGreaterThan(300);
    expect(unexpected, `${unexpected.length} of ${sent} bad requests were not refused cleanly`).toEqual([]);
    expect(fixed, 'KNOWN entries that now pass: remove them').toEqual([]);
  });
});
