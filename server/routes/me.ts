import { Router } from 'express';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Team } from '../entities/team.ts';
import { requireAuth, userOf } from '../middleware/require-auth.ts';

export interface Me {
  user: { id: string; email: string; name: string; role: AuthUser['role'] };
  team: { id: string; name: string };
}

export async function meOf(ctx: AppContext, user: AuthUser): Promise<Me> {
  const team = await ctx.db.getRepository(Team).findOneByOrFail({ id: user.teamId });
  return { user: { id: user.id, email: user.email, name: user.name, role: user.role }, team: { id: team.id, name: team.name } };
}

/** GET /api/me: the signed-in user, their team and role. */
export function meRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/', requireAuth, async (req, res) => {
    res.json(await meOf(ctx, userOf(req)));
  });
  return router;
}
