/**
 * The set-up most api test files share: a migrated test context (optionally with the fake SMTP server as its
 * mailer), an app, and before every case empty tables, a seeded team (and optionally a second one) and
 * signed-in clients. Call once at the top level of a test file; it registers the vitest hooks itself, so a
 * file's own beforeAll/beforeEach run after it and its own afterAll before it.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, beforeEach } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { authed, seedTeam, startTestMail, type AuthedClient, type SeededTeam, type TestMail } from './auth.ts';
import { openTestContext, truncateAll } from './db.ts';

/** A seeded user of the team, or `outsider`: the engineer of the other team. */
export type ApiTestRole = 'admin' | 'engineer' | 'reviewer' | 'outsider';

export interface ApiTestOptions {
  /** Config overrides for openTestContext (e.g. a low upload limit). */
  env?: Record<string, string>;
  /** Start the fake SMTP server and give its mailer to the app. */
  mail?: boolean;
  /** Name of the team seeded before every case (a random one when omitted). */
  team?: string;
  /** Also seed a second team before every case: its name, or true for a random one. Implied by 'outsider'. */
  other?: string | true;
  /** Roles signed in before every case. */
  signIn?: readonly ApiTestRole[];
  /** One app for the whole file instead of a fresh one (fresh rate-limit counters) for every case. */
  appPerFile?: boolean;
}

export interface ApiTest {
  readonly ctx: AppContext;
  readonly app: Express;
  readonly mail: TestMail;
  readonly team: SeededTeam;
  readonly other: SeededTeam;
  readonly admin: AuthedClient;
  readonly engineer: AuthedClient;
  readonly reviewer: AuthedClient;
  readonly outsider: AuthedClient;
}

export function useApiTest(options: ApiTestOptions = {}): ApiTest {
  const roles = options.signIn ?? [];
  const otherName = options.other ?? (roles.includes('outsider') ? true : undefined);
  let ctx: AppContext | undefined;
  let app: Express | undefined;
  let mail: TestMail | undefined;
  let team: SeededTeam | undefined;
  let other: SeededTeam | undefined;
  let clients: Partial<Record<ApiTestRole, AuthedClient>> = {};

  beforeAll(async () => {
    const base = await openTestContext(options.env);
    if (options.mail) mail = await startTestMail(base.db);
    ctx = mail ? { ...base, mailer: mail.mailer } : base;
    if (options.appPerFile) app = createApp(ctx);
  });
  afterAll(async () => {
    await mail?.close();
    await ctx?.db.destroy();
  });
  beforeEach(async () => {
    const c = ctx!;
    await truncateAll(c.db);
    if (!options.appPerFile) app = createApp(c);
    team = await seedTeam(c.db, options.team);
    other = otherName === undefined ? undefined : await seedTeam(c.db, otherName === true ? undefined : otherName);
    const users = { admin: team.admin, engineer: team.engineer, reviewer: team.reviewer, outsider: other?.engineer };
    const signedIn = await Promise.all(roles.map((role) => authed(app!, users[role]!)));
    clients = Object.fromEntries(roles.map((role, i) => [role, signedIn[i]]));
  });

  // A clear failure when a file reads what its options did not ask for (or reads it before the hooks ran).
  const need = <T>(value: T | undefined, what: string): T => {
    if (value === undefined) throw new Error(`useApiTest: no ${what} (not asked for in the options, or read before the hooks ran)`);
    return value;
  };
  return {
    get ctx() { return need(ctx, 'ctx'); },
    get app() { return need(app, 'app'); },
    get mail() { return need(mail, 'mail (mail: true)'); },
    get team() { return need(team, 'team'); },
    get other() { return need(other, 'other team (other or signIn outsider)'); },
    get admin() { return need(clients.admin, "admin client (signIn: ['admin'])"); },
    get engineer() { return need(clients.engineer, "engineer client (signIn: ['engineer'])"); },
    get reviewer() { return need(clients.reviewer, "reviewer client (signIn: ['reviewer'])"); },
    get outsider() { return need(clients.outsider, "outsider client (signIn: ['outsider'])"); },
  };
}
