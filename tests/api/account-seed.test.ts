import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { User } from '../../server/entities/user.ts';
import { DEMO_TEAM_NAME, DEMO_USERS, seedAccounts } from '../../server/seed/accounts.ts';
import { authed } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;
let app: Express;
beforeAll(async () => {
  ctx = await openTestContext();
  await truncateAll(ctx.db);
  app = createApp(ctx);
});
afterAll(async () => {
  await ctx.db.destroy();
});

describe('demo accounts', () => {
  it('seed one user per role in an invented team, with passwords of at least 10 characters', async () => {
    const { team } = await seedAccounts(ctx);
    expect(team.name).toBe(DEMO_TEAM_NAME);
    expect(DEMO_USERS.map((u) => u.role).sort()).toEqual(['admin', 'engineer', 'reviewer']);
    for (const demo of DEMO_USERS) {
      expect(demo.password.length).toBeGreaterThanOrEqual(10);
      const client = await authed(app, demo);
      const me = await client.get('/api/me');
      expect(me.body.user.role).toBe(demo.role);
      expect(me.body.team.name).toBe(DEMO_TEAM_NAME);
    }
  });

  it('are idempotent and keep a password the user has changed', async () => {
    const admin = await authed(app, DEMO_USERS[0]!);
    expect((await admin.put('/api/account/password').send({ currentPassword: DEMO_USERS[0]!.password, newPassword: 'changed-after-demo' })).status).toBe(204);
    await seedAccounts(ctx);
    await seedAccounts(ctx);
    expect(await ctx.db.getRepository(User).count()).toBe(3);
    await authed(app, { email: DEMO_USERS[0]!.email, password: 'changed-after-demo' });
  });
});
