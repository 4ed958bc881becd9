/** The signed-in user as the client sees them: who they are, their role and their team's name. */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { NotFound } from '../errors.ts';

export interface Me {
  user: { id: string; email: string; name: string; role: AuthUser['role'] };
  team: { id: string; name: string };
}

/**
 * Team names, kept a minute: every page load asks /api/me, and nothing in the app renames a team (the minute
 * bounds what a change made directly in the database would take to show).
 */
const TEAM_NAME_TTL_MS = 60_000;
const teamNames = new Map<string, { name: string; at: number }>();

async function teamName(ctx: AppContext, teamId: string): Promise<string> {
  const hit = teamNames.get(teamId);
  if (hit && Date.now() - hit.at < TEAM_NAME_TTL_MS) return hit.name;
  const [team] = (await ctx.db.query('SELECT name FROM teams WHERE id = $1', [teamId])) as { name: string }[];
  if (!team) throw NotFound('team');
  if (teamNames.size > 10_000) teamNames.clear();
  teamNames.set(teamId, { name: team.name, at: Date.now() });
  return team.name;
}

export async function meOf(ctx: AppContext, user: AuthUser): Promise<Me> {
  return { user: { id: user.id, email: user.email, name: user.name, role: user.role }, team: { id: user.teamId, name: await teamName(ctx, user.teamId) } };
}
