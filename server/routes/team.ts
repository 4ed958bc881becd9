import { Router } from 'express';
import { linkBase } from '../auth/links.ts';
import { InvitationIdParams, InviteBody, RoleBody, UserIdParams } from '../auth/schemas.ts';
import type { AppContext } from '../context.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { inviteMember, listInvitations, revokeInvitation } from '../services/invitation-service.ts';
import { changeRole, getTeam, removeMember } from '../services/team-service.ts';

/** /api/team: every member sees the member list; admins change roles, remove members and invite. */
export function teamRouter(ctx: AppContext): Router {
  const router = Router();
  const admin = requireRole('admin');
  router.get('/team', requireAuth, async (req, res) => {
    res.json(await getTeam(ctx, userOf(req)));
  });
  router.patch('/team/members/:userId', admin, validate({ params: UserIdParams, body: RoleBody }), async (req, res) => {
    res.json(await changeRole(ctx, userOf(req), req.params.userId as string, parsed(req, 'body', RoleBody).role));
  });
  router.delete('/team/members/:userId', admin, validate({ params: UserIdParams }), async (req, res) => {
    await removeMember(ctx, userOf(req), req.params.userId as string);
    res.status(204).end();
  });
  router.get('/team/invitations', admin, async (req, res) => {
    res.json(await listInvitations(ctx, userOf(req)));
  });
  router.post('/team/invitations', admin, validate({ body: InviteBody }), async (req, res) => {
    const body = parsed(req, 'body', InviteBody);
    res.status(201).json(await inviteMember(ctx, userOf(req), body, linkBase(ctx.config, req)));
  });
  router.delete('/team/invitations/:invitationId', admin, validate({ params: InvitationIdParams }), async (req, res) => {
    await revokeInvitation(ctx, userOf(req), req.params.invitationId as string);
    res.status(204).end();
  });
  return router;
}
