/**
 * The harness of tests/api/bad-input.test.ts: how bad requests are made from a valid body (every leaf spoiled in
 * turn), the cases every route gets, and how one case is sent and judged (a 4xx JSON error naming the field,
 * every table unchanged). The per-route data (valid bodies, bad queries) stays in the test.
 */
import { randomUUID } from 'node:crypto';
import bytes from 'bytes';
import type request from 'supertest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { anonymous, type Agent } from './auth.ts';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';
export type Role = 'engineer' | 'admin' | 'reviewer';

export interface BodySpec {
  body: (ids: Record<string, string>) => Record<string, unknown>;
  /** Fields for which '' is a valid value (free text that may be blank). */
  allowEmpty?: string[];
  /** The route deliberately drops unknown fields (a file format that may grow). */
  allowUnknown?: boolean;
}

export const LONG = 'x'.repeat(100_000);
export const RAW = (text: string) => `\u0000raw:${text}\u0000`; // a placeholder replaced by raw JSON text
export const COUNT_FIELD = /^(n[xy]|trials|points|position|failedElements|phaseBits|maxChannels|minChannels|seed|channel|nbar|version)$/;

export interface Case {
  label: string;
  /** The field a good answer names (a prefix or an extension of it is fine); '' = any field. */
  field: string;
  send: (req: request.Test) => request.Test;
}

export const rawJson = (value: unknown) =>
  JSON.stringify(value).replace(/"\\u0000raw:(.*?)\\u0000"/g, (_m, text: string) => text);
export const json = (value: unknown) => (req: request.Test) => req.set('content-type', 'application/json').send(rawJson(value));

export function setPath(target: unknown, path: (string | number)[], value: unknown): unknown {
  const copy = structuredClone(target) as Record<string | number, unknown>;
  let node = copy;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  node[path[path.length - 1]!] = value;
  return copy;
}

export const fieldName = (path: (string | number)[]) =>
  path.reduce<string>((out, k) => (typeof k === 'number' ? `${out}[${k}]` : out === '' ? k : `${out}.${k}`), '');

/** Every value position of a body, depth first, with its path. */
export function leaves(value: unknown, path: (string | number)[] = []): { path: (string | number)[]; value: unknown }[] {
  const here = path.length > 0 ? [{ path, value }] : [];
  if (Array.isArray(value)) return [...here, ...value.flatMap((v, i) => leaves(v, [...path, i]))];
  if (value !== null && typeof value === 'object') return [...here, ...Object.entries(value).flatMap(([k, v]) => leaves(v, [...path, k]))];
  return here;
}

/** Spoiled copies of a valid body, one field at a time. */
export function fieldCases(spec: BodySpec, ids: Record<string, string>): Case[] {
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

/** Cases that need no knowledge of the route's body; `bodyLimit` is the server's BODY_LIMIT setting. */
export function genericBodyCases(bodyLimit: string): Case[] {
  // Read as express.json reads its limit, so the oversized case tracks the configuration.
  const limitBytes = bytes.parse(bodyLimit);
  if (limitBytes === null) throw new Error(`BODY_LIMIT ${bodyLimit} is not a size`);
  return [
    { label: 'malformed JSON', field: 'body', send: (r) => r.set('content-type', 'application/json').send('{"name": "unfinished",') },
    { label: 'JSON text "just text"', field: 'body', send: (r) => r.set('content-type', 'application/json').send('"just text"') },
    { label: 'JSON null', field: 'body', send: (r) => r.set('content-type', 'application/json').send('null') },
    { label: 'a list where an object is expected', field: '', send: json([1, 'two']) },
    { label: 'only an unknown field', field: '', send: json({ zzUnknown: 1 }) },
    { label: 'text/plain', field: '', send: (r) => r.set('content-type', 'text/plain').send('{"name":"x"}') },
    { label: 'multipart where JSON is expected', field: '', send: (r) => r.field('name', 'x').field('zzUnknown', '1') },
    {
      label: `JSON body over BODY_LIMIT (${limitBytes + 1024} bytes)`,
      field: 'body',
      send: (r) => r.set('content-type', 'application/json').send(JSON.stringify({ name: 'x'.repeat(limitBytes + 1024) })),
    },
  ];
}

/** A range-data file the parser accepts: a smooth beam sampled every degree. */
export const RANGE_CSV = Buffer.from(
  `angle_deg,power_dB\n${Array.from({ length: 181 }, (_, i) => `${i - 90},${Math.max(-40, -0.02 * (i - 90) ** 2).toFixed(2)}`).join('\n')}\n`,
);

export function multipartCases({ fields, numeric }: { fields: Record<string, string>; numeric: string[] }, uploadLimit: number): Case[] {
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

export function paramCases(path: string): { label: string; field: string; path: string }[] {
  const names = [...path.matchAll(/:(\w+)/g)].map((m) => m[1]!);
  return names.flatMap((name) =>
    (name === 'token' ? ['x', 'y'.repeat(300)] : ['not-a-uuid', '12345', "1'; DROP TABLE studies;--", `${randomUUID()}x`]).map((bad) => ({
      label: `:${name} = ${bad.length > 40 ? `${bad.length} characters` : JSON.stringify(bad)}`,
      field: `params.${name}`,
      path: path.replace(`:${name}`, encodeURIComponent(bad)),
    })),
  );
}

/** One text per table: every row, so an insert, update or delete anywhere changes it. */
export async function snapshot(db: AppContext['db'], tables: string[]): Promise<Record<string, string>> {
  const sql = tables.map((t) => `SELECT '${t}' AS t, md5(coalesce(string_agg(x::text, '|' ORDER BY x::text), '')) AS h FROM "${t}" x`).join(' UNION ALL ');
  const rows = (await db.query(sql)) as { t: string; h: string }[];
  return Object.fromEntries(rows.map((r) => [r.t, r.h]));
}

export interface Outcome {
  route: string;
  label: string;
  problem: string;
}

export const namedFields = (body: { error?: { message?: unknown; fields?: { field?: unknown }[] } }): string[] => {
  const fromMessage = typeof body.error?.message === 'string' ? /^([\w.[\]]+): /.exec(body.error.message)?.[1] : undefined;
  const fromList = (body.error?.fields ?? []).map((f) => f.field).filter((f): f is string => typeof f === 'string' && f !== '');
  return [...(fromMessage ? [fromMessage] : []), ...fromList];
};

export const bare = (f: string) => f.replace(/^(query|params)\./, '');
/** Same field, one inside the other, or the same field named without its query./params. prefix. */
export const related = (x: string, y: string) => {
  const [a, b] = [bare(x), bare(y)];
  return  a === b || a.startsWith(`${b}.`) || a.startsWith(`${b}[`) || b.startsWith(`${a}.`) || b.startsWith(`${a}[`);
};

/** What a case runs against: the app's context, the signed-in agents, the tables to watch and which routes are public. */
export interface CaseWorld {
  ctx: AppContext;
  agents: Record<Role, { agent: Agent; csrf: string }>;
  tables: string[];
  isPublic: (route: string) => boolean;
}

/** Sends one bad request and reports what was wrong with the answer (null: refused cleanly, nothing written). */
export async function runCase(world: CaseWorld, route: string, method: Method, path: string, role: Role, c: Case | { label: string; field: string; send?: Case['send'] }): Promise<Outcome | null> {
  const { ctx, agents, tables, isPublic } = world;
  const before = await snapshot(ctx.db, tables);
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
  const after = await snapshot(ctx.db, tables);
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
