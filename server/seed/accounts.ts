/**
 * Demo team for `npm start`: an invented company with one user of each role. Idempotent: an existing
 * account (matched by e-mail) is left as it is, including a password its owner has changed.
 * The passwords are listed in README.md; anyone running a shared server should change them.
 */
import { hashPassword } from '../auth/password.ts';
import type { AppContext } from '../context.ts';
import { Team } from '../entities/team.ts';
import { User, type TeamRole } from '../entities/user.ts';

export const DEMO_TEAM_NAME = 'Harrow Point Radio';

export const DEMO_USERS: readonly { role: TeamRole; email: string; name: string; password: string }[] = [
  { role: 'admin', email: 'admin@harrowpoint.example', name: 'Ilse Marrow', password: 'harrow-admin-2468' },
  { role: 'engineer', email: 'engineer@harrowpoint.example', name: 'Tomas Quayle', password: 'harrow-engineer-1357' },
  { role: 'reviewer', email: 'reviewer@harrowpoint.example', name: 'Odile Fenn', password: 'harrow-reviewer-9753' },
];

export async function seedAccounts(ctx: AppContext): Promise<{ team: Team; users: User[] }> {
  return ctx.db.transaction(async (m) => {
    const teams = m.getRepository(Team);
    const users = m.getRepository(User);
    // The demo team is found through its admin, so renaming the team does not create a second one.
    const admin = await users.findOneBy({ email: DEMO_USERS[0]!.email });
    const team = (admin && (await teams.findOneBy({ id: admin.teamId }))) ?? (await teams.save({ name: DEMO_TEAM_NAME }));
    const out: User[] = [];
    for (const demo of DEMO_USERS) {
      const existing = await users.findOneBy({ email: demo.email });
      if (existing) {
        out.push(existing);
        continue;
      }
      const passwordHash = await hashPassword(ctx.config, demo.password);
      out.push(await users.save({ email: demo.email, name: demo.name, role: demo.role, teamId: team.id, passwordHash }));
    }
    return { team, users: out };
  });
}
