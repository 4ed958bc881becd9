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
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { anonymous, seedTeam, signIn, type Agent } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';
import { listRoutes } from '../helpers/routes.ts';
import { fixtures, matrix, type MatrixWorld } from './route-matrix.ts';


type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';
type Role = 'engineer' | 'admin' | 'reviewer';

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

interface BodySpec {
  body: (ids: Record<string, string>) => Record<string, unknown>;
  /** Fields for which '' is a valid value (free text that may be blank). */
  allowEmpty?: string[];
  /** The route deliberately drops unknown fields (a file format that may grow). */
  allowUnknown?: boolean;
}

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
  'PATCH /api/devices/:id': { body: (ids) => ({ name: 'Phone 2', notes: 'n', layout: DEVICE_LAYOUT(ids) }), allowEmpty: ['notes'] },
  'POST /api/studies/:id/target-sheets': {
    body: () => ({ preset: null, sheet: { name: 'Small cell', minSectorEirpDbm: 43, serviceSector: { azMinDeg: -50, azMaxDeg: 50, elMinDeg: -10, elMaxDeg: 10 } } }),
  },
  'PUT /api/studies/:id/target-sheets/:sheetId': {
    body: () => ({ preset: 'handset-28ghz', sheet: { name: 'Handset', band: 'n257', minPeakEirpDbm: 22.4, minCoverageP50EirpDbm: 11.5 } }),
  },
  'POST /api/studies/:id/sweeps': {
    body: () => ({ name: 'Spoilt sweep', grid: { frequencyGHz: 28, nx: [4, 8], dxMm: 5.35, steerAzDeg: [0, 30] }, constraints: { maxChannels: 64, maxApertureXMm: 100 } }),
  },
  'POST /api/studies/:id/comments': { body: () => ({ body: 'Looks fine', target: { kind: 'study' }, mentions: [] }) },
  'POST /api/studies/:id/review-requests': { body: (ids) => ({ reviewerIds: [ids.reviewerId], message: 'please look' }), allowEmpty: ['message'] },
  'POST /api/review-requests/:id/answer': { body: () => ({ state: 'approved', note: 'ok' }), allowEmpty: ['note'] },
  'POST /api/studies/:id/decisions': {
    body: () => ({ design: { ...DESIGN }, label: 'Choice', rationale: 'Because', alternatives: [{ label: 'Other', reason: 'r' }], sign: false }),
    allowEmpty: ['alternatives[0].reason'],
  },
  'PATCH /api/decisions/:id': { body: () => ({ label: 'Choice 2', rationale: 'Because 2' }) },
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
  // Over-long beams: 15,000 characters, as Node refuses request lines over 16 KiB before the app sees them.
  'GET /api/candidates/:id/codes.csv': ['beams=', `beams=${'9:'.repeat(7_500)}`, 'beams=-30:30:15&threshold=NaN', 'beams=-30:30:15&threshold=1e999',
    'beams=-30:30:15&threshold=-1', 'beams=-30:30:15&calibration=zz'],
  'GET /api/studies/:id/packet': ['distanceM=-1', 'distanceM=NaN', 'distanceM=1e999', 'distanceM=abc', 'referenceWm2=0', 'referenceWm2=1e308'],
  'GET /api/studies/:id/packet.pdf': ['distanceM=-1', 'distanceM=Infinity', 'referenceWm2=abc'],
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

const BODY_LIMIT_BYTES = 1024 * 1024; // BODY_LIMIT default '1mb' in server/config.ts
const LONG = 'x'.repeat(100_000);
const RAW = (text: string) => `\u0000raw:${text}\u0000`; // a placeholder replaced by raw JSON text
const COUNT_FIELD = /^(n[xy]|trials|points|position|failedElements|phaseBits|maxChannels|minChannels|seed|channel|nbar|version)$/;

interface Case {
  label: string;
  /** The field a good answer names (a prefix or an extension of it is fine); '' = any field. */
  field: string;
  send: (req: request.Test) => request.Test;
}

const rawJson = (value: unknown) =>
  JSON.stringify(value).replace(/"\\u0000raw:(.*?)\\u0000"/g, (_m, text: string) => text);
const json = (value: unknown) => (req: request.Test) => req.set('content-type', 'application/json').send(rawJson(value));

function setPath(target: unknown, path: (string | number)[], value: unknown): unknown {
  const copy = structuredClone(target) as Record<string | number, unknown>;
  let node = copy;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  node[path[path.length - 1]!] = value;
  return copy;
}

const fieldName = (path: (string | number)[]) =>
  path.reduce<string>((out, k) => (typeof k === 'number' ? `${out}[${k}]` : out === '' ? k : `${out}.${k}`), '');

/** Every value position of a body, depth first, with its path. */
function leaves(value: unknown, path: (string | number)[] = []): { path: (string | number)[]; value: unknown }[] {
  const here = path.length > 0 ? [{ path, value }] : [];
  if (Array.isArray(value)) return [...here, ...value.flatMap((v, i) => leaves(v, [...path, i]))];
  if (value !== null && typeof value === 'object') return [...here, ...Object.entries(value).flatMap(([k, v]) => leaves(v, [...path, k]))];
  return here;
}

/** Spoiled copies of a valid body, one field at a time. */
function fieldCases(spec: BodySpec, ids: Record<string, string>): Case[] {
  const base = spec.body(ids);
  const out: Case[] = [];
  for (const { path, value } of leaves(base)) {
    const field = fieldName(path);
    const key = String(path[path.length - 1]);
    const spoil = (label: string, v: unknown) => out.push({ label: `${field} = ${label}`, field, send: json(setPath(base, path, v)) });
    if (typeof value === 'number') {
      spoil('"12"', '12');
      spoil('true', true);
      spoil('1e308', 1e308);
      spoil('2**53+1', RAW('9007199254740993'));
      spoil('"NaN"', 'NaN');
      spoil('"Infinity"', 'Infinity');
      spoil('1e999', RAW('1e999'));
      spoil('-1e999', RAW('-1e999'));
      if (COUNT_FIELD.test(key)) spoil('-1', -1);
      if (Number.isInteger(value) && COUNT_FIELD.test(key)) spoil('2.5', 2.5);
    } else if (typeof value === 'string') {
      spoil('12345', 12345);
      if (!spec.allowEmpty?.includes(field)) spoil('""', '');
      spoil('100k characters', LONG);
    } else if (typeof value === 'boolean') {
      spoil('"yes"', 'yes');
      spoil('1', 1);
    } else if (Array.isArray(value)) {
      spoil('"text"', 'text');
      spoil('{}', {});
    } else if (value !== null && typeof value === 'object') {
      spoil('"text"', 'text');
      spoil('[]', []);
    }
  }
  if (!spec.allowUnknown) {
    out.push({ label: 'valid body plus an unknown field', field: 'zzUnknown', send: json({ ...base, zzUnknown: 1 }) });
  }
  return out;
}

/** Cases that need no knowledge of the route's body. */
function genericBodyCases(): Case[] {
  return [
    { label: 'malformed JSON', field: 'body', send: (r) => r.set('content-type', 'application/json').send('{"name": "unfinished",') },
    { label: 'JSON text "just text"', field: 'body', send: (r) => r.set('content-type', 'application/json').send('"just text"') },
    { label: 'JSON null', field: 'body', send: (r) => r.set('content-type', 'application/json').send('null') },
    { label: 'a list where an object is expected', field: '', send: json([1, 'two']) },
    { label: 'only an unknown field', field: '', send: json({ zzUnknown: 1 }) },
    { label: 'text/plain', field: '', send: (r) => r.set('content-type', 'text/plain').send('{"name":"x"}') },
    { label: 'multipart where JSON is expected', field: '', send: (r) => r.field('name', 'x').field('zzUnknown', '1') },
    {
      label: `JSON body over BODY_LIMIT (${BODY_LIMIT_BYTES + 1024} bytes)`,
      field: 'body',
      send: (r) => r.set('content-type', 'application/json').send(JSON.stringify({ name: 'x'.repeat(BODY_LIMIT_BYTES + 1024) })),
    },
  ];
}

/** A range-data file the parser accepts: a smooth beam sampled every degree. */
const RANGE_CSV = Buffer.from(
  `angle_deg,power_dB\n${Array.from({ length: 181 }, (_, i) => `${i - 90},${Math.max(-40, -0.02 * (i - 90) ** 2).toFixed(2)}`).join('\n')}\n`,
);

function multipartCases({ fields, numeric }: { fields: Record<string, string>; numeric: string[] }, uploadLimit: number): Case[] {
  const form = (values: Record<string, string>, file: Buffer | null) => (r: request.Test) => {
    for (const [k, v] of Object.entries(values)) r = r.field(k, v);
    return file ? r.attach('file', file, 'run.csv') : r;
  };
  const out: Case[] = [
    { label: 'JSON where multipart is expected', field: 'file', send: json(Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, Number(v) || v]))) },
    { label: 'form without the file', field: 'file', send: form(fields, null) },
    { label: 'a file that is not a range CSV', field: 'file', send: form(fields, Buffer.from('\u0000\u0001 not,a\nrange;file')) },
    { label: 'two files', field: 'file', send: (r) => form(fields, RANGE_CSV)(r).attach('file', RANGE_CSV, 'again.csv') },
    { label: 'the file in another field', field: 'other', send: (r) => form(fields, null)(r).attach('other', RANGE_CSV, 'run.csv') },
    { label: `a file over UPLOAD_LIMIT_BYTES (${uploadLimit + 1} bytes)`, field: 'file', send: form(fields, Buffer.alloc(uploadLimit + 1, '1')) },
  ];
  for (const key of Object.keys(fields)) {
    for (const bad of numeric.includes(key) ? ['NaN', 'Infinity', '1e999', '-1e999', '1e308', 'abc', ''] : ['', LONG.slice(0, 70_000)]) {
      out.push({ label: `${key} = ${bad.length > 20 ? `${bad.length} characters` : JSON.stringify(bad)}`, field: key, send: form({ ...fields, [key]: bad }, RANGE_CSV) });
    }
  }
  out.push({ label: 'unknown form field', field: 'zzUnknown', send: form({ ...fields, zzUnknown: '1' }, RANGE_CSV) });
  return out;
}

function paramCases(path: string): { label: string; field: string; path: string }[] {
  const names = [...path.matchAll(/:(\w+)/g)].map((m) => m[1]!);
  return names.flatMap((name) =>
    (name === 'token' ? ['x', 'y'.repeat(300)] : ['not-a-uuid', '12345', "1'; DROP TABLE studies;--", `${randomUUID()}x`]).map((bad) => ({
      label: `:${name} = ${bad.length > 40 ? `${bad.length} characters` : JSON.stringify(bad)}`,
      field: `params.${name}`,
      path: path.replace(`:${name}`, encodeURIComponent(bad)),
    })),
  );
}

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

/** One text per table: every row, so an insert, update or delete anywhere changes it. */
async function snapshot(): Promise<Record<string, string>> {
  const sql = tables.map((t) => `SELECT '${t}' AS t, md5(coalesce(string_agg(x::text, '|' ORDER BY x::text), '')) AS h FROM "${t}" x`).join(' UNION ALL ');
  const rows = (await ctx.db.query(sql)) as { t: string; h: string }[];
  return Object.fromEntries(rows.map((r) => [r.t, r.h]));
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

interface Outcome {
  route: string;
  label: string;
  problem: string;
}

const namedFields = (body: { error?: { message?: unknown; fields?: { field?: unknown }[] } }): string[] => {
  const fromMessage = typeof body.error?.message === 'string' ? /^([\w.[\]]+): /.exec(body.error.message)?.[1] : undefined;
  const fromList = (body.error?.fields ?? []).map((f) => f.field).filter((f): f is string => typeof f === 'string' && f !== '');
  return [...(fromMessage ? [fromMessage] : []), ...fromList];
};

const bare = (f: string) => f.replace(/^(query|params)\./, '');
/** Same field, one inside the other, or the same field named without its query./params. prefix. */
const related = (x: string, y: string) => {
  const [a, b] = [bare(x), bare(y)];
  return  a === b || a.startsWith(`${b}.`) || a.startsWith(`${b}[`) || b.startsWith(`${a}.`) || b.startsWith(`${a}[`);
};

async function runCase(route: string, method: Method, path: string, role: Role, c: Case | { label: string; field: string; send?: Case['send'] }): Promise<Outcome | null> {
  const before = await snapshot();
  let client: { agent: Agent; csrf: string };
  // Public routes are rate limited per app: each case gets a fresh app (and so fresh limiters).
  if (isPublic(route)) client = await anonymous(createApp(ctx));
  else client = agents[role];
  let req = client.agent[method](path);
  if (method !== 'get') req = req.set('x-csrf-token', client.csrf);
  if (c.send) req = c.send(req);
  let res: request.Response;
  try {
    res = await req;
  } catch (err) {
    return { route, label: c.label, problem: `request failed: ${String(err)}` };
  }
  const after = await snapshot();
  const changed = tables.filter((t) => before[t] !== after[t]);
  const problems: string[] = [];
  const body = res.body as { error?: { code?: unknown; message?: unknown; fields?: { field?: unknown }[] } };
  if (res.status < 400 || res.status >= 500) problems.push(`answered ${res.status}`);
  if (!/application\/json/.test(String(res.headers['content-type'])) || typeof body.error?.code !== 'string' || typeof body.error?.message !== 'string') {
    problems.push(`not a JSON {error:{code,message}}: ${String(res.headers['content-type'])} ${res.text?.slice(0, 120)}`);
  } else if (res.status >= 400 && res.status < 500) {
    const named = namedFields(body);
    if (named.length === 0) problems.push(`names no field: "${String(body.error.message)}"`);
    else if (c.field !== '' && !named.some((n) => related(n, c.field))) problems.push(`names ${named.join(', ')} instead of ${c.field}`);
  }
  if (changed.length > 0) problems.push(`wrote to ${changed.join(', ')}`);
  if (problems.length === 0) return null;
  const message = typeof body.error?.message === 'string' ? ` (${body.error.message.slice(0, 100)})` : '';
  return { route, label: c.label, problem: `${problems.join('; ')}${message}` };
}

function casesFor(route: string, uploadLimit: number): { label: string; field: string; send?: Case['send']; path?: string }[] {
  const [method, path] = route.split(' ') as [string, string];
  const out: { label: string; field: string; send?: Case['send']; path?: string }[] = paramCases(path).map((p) => ({ ...p }));
  if (method === 'GET') {
    for (const q of QUERIES[route] ?? []) out.push({ label: `?${q.length > 60 ? `${q.slice(0, 40)}… (${q.length} characters)` : q}`, field: `query.${q.split('&').pop()!.split(/[=[]/)[0]}`, path: `${fillPath(route)}?${q}` });
    return out;
  }
  if (method === 'DELETE') return out;
  const generic = genericBodyCases();
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
        const outcome = await runCase(route, method, c.path ?? path, role, c);
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
