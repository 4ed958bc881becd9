/** Every API route × {anonymous, reviewer, engineer, admin, another team's admin} gets its expected status. */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { anonymous, seedTeam, signIn, type Agent } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';
import { listRoutes } from '../helpers/routes.ts';
import { fixtures, matrix, type MatrixRow, type MatrixWorld } from './route-matrix.ts';


const CALLERS = ['anonymous', 'reviewer', 'engineer', 'admin', 'otherTeam'] as const;
type Caller = (typeof CALLERS)[number];

let ctx: AppContext;
beforeAll(async () => {
  ctx = await openTestContext();
});
afterAll(async () => {
  await ctx.db.destroy();
});

async function freshWorld(): Promise<MatrixWorld> {
  await truncateAll(ctx.db);
  const world: MatrixWorld = { ctx, team: await seedTeam(ctx.db, 'Team A'), other: await seedTeam(ctx.db, 'Team B'), ids: {} };
  for (const fixture of fixtures) Object.assign(world.ids, await fixture(world));
  return world;
}

function fillPath(row: MatrixRow, ids: Record<string, string>): string {
  return row.path.replace(/:(\w+)/g, (_m, name: string) => {
    const key = row.params?.[name] ?? name;
    const value = ids[key];
    if (value === undefined) throw new Error(`${row.method} ${row.path}: no fixture id named "${key}"`);
    return encodeURIComponent(value);
  });
}

async function callerAgent(app: Express, world: MatrixWorld, caller: Caller): Promise<{ agent: Agent; csrf: string }> {
  const user = { reviewer: world.team.reviewer, engineer: world.team.engineer, admin: world.team.admin, otherTeam: world.other.admin };
  return caller === 'anonymous' ? anonymous(app) : signIn(app, user[caller]);
}

async function statusFor(row: MatrixRow, caller: Caller, shared?: MatrixWorld): Promise<number> {
  const world = shared ?? (await freshWorld());
  const app = createApp(ctx);
  const { agent, csrf } = await callerAgent(app, world, caller);
  const path = fillPath(row, world.ids);
  const method = row.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  let req = agent[method](path);
  if (row.method !== 'GET') req = req.set('x-csrf-token', csrf).send((row.body ?? {}) as object);
  return (await req).status;
}

describe('route-by-role matrix', () => {
  it('has exactly one row for every registered API route', () => {
    const registered = listRoutes(createApp(ctx)).filter((r) => r.split(' ')[1]!.startsWith('/api/'));
    const rows = matrix.map((r) => `${r.method} ${r.path}`);
    const duplicates = rows.filter((r, i) => rows.indexOf(r) !== i);
    expect(duplicates, 'rows listed twice in tests/api/route-matrix.ts').toEqual([]);
    expect(registered.filter((r) => !rows.includes(r)), 'routes without a row in tests/api/route-matrix.ts').toEqual([]);
    expect(rows.filter((r) => !registered.includes(r)), 'rows naming no registered route').toEqual([]);
  });

  it.each(matrix.map((row) => [`${row.method} ${row.path}`, row] as const))('%s', async (_name, row) => {
    const got: Record<string, number> = {};
    const want: Record<string, number> = {};
    // GETs change nothing, so the five callers may share one world; anything else gets a fresh one each.
    const shared = row.method === 'GET' ? await freshWorld() : undefined;
    for (const caller of CALLERS) {
      got[caller] = await statusFor(row, caller, shared);
      want[caller] = row[caller];
    }
    expect(got).toEqual(want);
  });
});
