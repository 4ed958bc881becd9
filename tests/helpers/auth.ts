/**
 * Accounts for tests: a seeded team with one user per role, signed-in supertest agents that carry the
 * session cookie and CSRF token, and the local fake SMTP server on a free port.
 */
import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { hashPassword } from '../../server/auth/password.ts';
import { Team } from '../../server/entities/team.ts';
import { User, type TeamRole } from '../../server/entities/user.ts';
import { MailMessage } from '../../server/entities/mail-message.ts';
import { startFakeSmtp } from '../../server/mail/fake-smtp.ts';
import { createMailer, type Mailer } from '../../server/mail/mailer.ts';
import { freePort } from '../../server/db/free-port.ts';

export const TEST_PASSWORD = 'test-password-0123';

export interface TestUser {
  id: string;
  email: string;
  name: string;
  password: string;
  role: TeamRole;
  teamId: string;
}

export interface SeededTeam {
  team: { id: string; name: string };
  admin: TestUser;
  engineer: TestUser;
  reviewer: TestUser;
}

// argon2 is slow on purpose; every seeded user shares one hash made once per test file.
let sharedHash: Promise<string> | undefined;
const passwordHash = () => (sharedHash ??= hashPassword({ NODE_ENV: 'test' }, TEST_PASSWORD));

/** Adds one user to a team (e-mail made unique unless given). */
export async function seedUser(db: DataSource, teamId: string, role: TeamRole, email?: string): Promise<TestUser> {
  const address = email ?? `${role}.${randomBytes(4).toString('hex')}@example.test`;
  const name = `${role[0]!.toUpperCase()}${role.slice(1)} ${address.split('@')[0]!.split('.')[1] ?? ''}`.trim();
  const user = await db.getRepository(User).save({ email: address, name, role, teamId, passwordHash: await passwordHash() });
  return { id: user.id, email: user.email, name: user.name, password: TEST_PASSWORD, role, teamId };
}

export async function seedTeam(db: DataSource, name = `Team ${randomBytes(3).toString('hex')}`): Promise<SeededTeam> {
  const team = await db.getRepository(Team).save({ name });
  return {
    team: { id: team.id, name: team.name },
    admin: await seedUser(db, team.id, 'admin'),
    engineer: await seedUser(db, team.id, 'engineer'),
    reviewer: await seedUser(db, team.id, 'reviewer'),
  };
}

export type Agent = ReturnType<typeof request.agent>;

async function csrfOf(agent: Agent): Promise<string> {
  const res = await agent.get('/api/auth/csrf');
  if (res.status !== 200) throw new Error(`GET /api/auth/csrf answered ${res.status}`);
  return (res.body as { token: string }).token;
}

/** An agent holding a session (anonymous until signed in) and a CSRF token valid for it. */
export async function anonymous(app: Express): Promise<{ agent: Agent; csrf: string }> {
  const agent = request.agent(app);
  return { agent, csrf: await csrfOf(agent) };
}

export async function signIn(app: Express, user: Pick<TestUser, 'email' | 'password'>): Promise<{ agent: Agent; csrf: string }> {
  const { agent, csrf } = await anonymous(app);
  const res = await agent.post('/api/auth/login').set('x-csrf-token', csrf).send({ email: user.email, password: user.password });
  if (res.status !== 200) throw new Error(`sign-in of ${user.email} answered ${res.status}: ${JSON.stringify(res.body)}`);
  // The session id changed at sign-in, and the CSRF token is bound to it.
  return { agent, csrf: await csrfOf(agent) };
}

export interface AuthedClient {
  agent: Agent;
  csrf: string;
  get(path: string): request.Test;
  post(path: string): request.Test;
  put(path: string): request.Test;
  patch(path: string): request.Test;
  delete(path: string): request.Test;
}

export function withCsrf({ agent, csrf }: { agent: Agent; csrf: string }): AuthedClient {
  return {
    agent,
    csrf,
    get: (p) => agent.get(p),
    post: (p) => agent.post(p).set('x-csrf-token', csrf),
    put: (p) => agent.put(p).set('x-csrf-token', csrf),
    patch: (p) => agent.patch(p).set('x-csrf-token', csrf),
    delete: (p) => agent.delete(p).set('x-csrf-token', csrf),
  };
}

/** Signed in as `user`; post/put/patch/delete carry the CSRF header. */
export async function authed(app: Express, user: Pick<TestUser, 'email' | 'password'>): Promise<AuthedClient> {
  return withCsrf(await signIn(app, user));
}

export interface TestMail {
  mailer: Mailer;
  port: number;
  /** Messages received so far, oldest first. */
  messages(): Promise<MailMessage[]>;
  /** The newest message to `address`; fails when there is none. */
  latestTo(address: string): Promise<MailMessage>;
  close(): Promise<void>;
}

/** The fake SMTP server on a free loopback port with a nodemailer mailer pointed at it. */
export async function startTestMail(db: DataSource): Promise<TestMail> {
  const fake = await startFakeSmtp(db, await freePort());
  const mailer = createMailer(fake.url, 'Lobewise test <no-reply@lobewise.test>');
  const repo = db.getRepository(MailMessage);
  return {
    mailer,
    port: fake.port,
    messages: () => repo.find({ order: { receivedAt: 'ASC' } }),
    async latestTo(address) {
      const rows = await repo
        .createQueryBuilder('m')
        .where(':a = ANY(m.to_addresses)', { a: address })
        .orderBy('m.received_at', 'DESC')
        .limit(1)
        .getMany();
      if (!rows[0]) throw new Error(`no mail to ${address}`);
      return rows[0];
    },
    async close() {
      mailer.close();
      await fake.close();
    },
  };
}

/** The first link in a mail's text part whose path starts with `pathPrefix` (e.g. '/invite/'). */
export function linkIn(text: string, pathPrefix: string): { url: string; token: string } {
  for (const m of text.matchAll(/https?:\/\/\S+/g)) {
    const url = new URL(m[0]);
    if (url.pathname.startsWith(pathPrefix)) return { url: m[0], token: url.pathname.slice(pathPrefix.length) };
  }
  throw new Error(`no ${pathPrefix} link in: ${text}`);
}
