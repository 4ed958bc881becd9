import { Router } from 'express';
import { ApiTokenBody, PasswordChangeBody, ProfileBody, TokenIdParams } from '../auth/schemas.ts';
import type { AppContext } from '../context.ts';
import { requireAuth, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { createToken, listTokens, revokeToken } from '../services/api-token-service.ts';
import { changePassword, updateProfile } from '../services/user-service.ts';
import { meOf } from '../services/me-service.ts';

/** /api/account: your own name, password and personal API tokens. */
export function accountRouter(ctx: AppContext): Router {
  const router = Router();
  router.patch('/account', requireAuth, validate({ body: ProfileBody }), async (req, res) => {
    const user = await updateProfile(ctx, userOf(req), parsed(req, 'body', ProfileBody).name);
    res.json(await meOf(ctx, user));
  });
  router.put('/account/password', requireAuth, validate({ body: PasswordChangeBody }), async (req, res) => {
    const body = parsed(req, 'body', PasswordChangeBody);
    await changePassword(ctx, userOf(req), body.currentPassword, body.newPassword, req.sessionID);
    res.status(204).end();
  });
  router.get('/account/tokens', requireAuth, async (req, res) => {
    res.json(await listTokens(ctx, userOf(req)));
  });
  router.post('/account/tokens', requireAuth, validate({ body: ApiTokenBody }), async (req, res) => {
    res.status(201).json(await createToken(ctx, userOf(req), parsed(req, 'body', ApiTokenBody).name));
  });
  router.delete('/account/tokens/:tokenId', requireAuth, validate({ params: TokenIdParams }), async (req, res) => {
    await revokeToken(ctx, userOf(req), req.params.tokenId as string);
    res.status(204).end();
  });
  return router;
}
