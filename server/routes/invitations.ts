import { Router, type RequestHandler } from 'express';
import { AcceptInviteBody, TokenParams } from '../auth/schemas.ts';
import type { AppContext } from '../context.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { acceptInvitation, describeInvitation } from '../services/invitation-service.ts';
import { meOf } from '../services/me-service.ts';

/** /api/invitations/:token: what an invitee sees and does before having an account (reachable signed out). */
export function invitationsRouter(ctx: AppContext): Router {
  const router = Router();

  const accept: RequestHandler = async (req, res, next) => {
    const user = await acceptInvitation(ctx, req.params.token as string, parsed(req, 'body', AcceptInviteBody));
    // Signed in straight away, on a fresh session id.
    req.login(user, (err) => {
      if (err) return next(err);
      meOf(ctx, user).then((me) => res.status(201).json(me), next);
    });
  };

  router.get('/invitations/:token', validate({ params: TokenParams }), async (req, res) => {
    res.json(await describeInvitation(ctx, req.params.token as string));
  });
  router.post('/invitations/:token/accept', validate({ params: TokenParams, body: AcceptInviteBody }), accept);
  return router;
}
