import { Router, type RequestHandler } from 'express';
import { InvalidCredentials } from '../auth/errors.ts';
import { authKit } from '../auth/kit.ts';
import { linkBase } from '../auth/links.ts';
import { mailRequestLimiter, signInLimiters } from '../auth/rate-limit.ts';
import { LoginBody, ResetBody, ResetRequestBody, TokenParams } from '../auth/schemas.ts';
import { SESSION_COOKIE } from '../auth/session.ts';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { audit } from '../services/audit-service.ts';
import { checkResetLink, requestPasswordReset, resetPassword } from '../services/password-reset-service.ts';
import { meOf } from '../services/me-service.ts';

/** /api/auth: CSRF token, sign-in, sign-out and password reset (all reachable signed out). */
export function authRouter(ctx: AppContext): Router {
  const router = Router();
  const { passport, csrf } = authKit(ctx);

  const signIn: RequestHandler = (req, res, next) => {
    // Read here, not in passport's callback, so a route missing its validate() throws where Express catches it.
    const { email } = parsed(req, 'body', LoginBody);
    passport.authenticate('local', (err: unknown, user: AuthUser | false) => {
      if (err) return next(err);
      if (!user) {
        audit(ctx, null, 'auth.sign_in_failed', null, { email }).then(() => next(InvalidCredentials()), next);
        return;
      }
      // passport regenerates the session here: a fresh id, so a planted id is worthless.
      req.login(user, (loginErr) => {
        if (loginErr) return next(loginErr);
        audit(ctx, user, 'auth.signed_in', { type: 'user', id: user.id })
          .then(() => meOf(ctx, user))
          .then((me) => res.json(me), next);
      });
    })(req, res, next);
  };

  const signOut: RequestHandler = (req, res, next) => {
    const user = req.user;
    req.session.destroy((err) => {
      if (err) return next(err);
      res.clearCookie(SESSION_COOKIE, { path: '/' });
      if (!user) return res.status(204).end();
      audit(ctx, user, 'auth.signed_out', { type: 'user', id: user.id }).then(() => res.status(204).end(), next);
    });
  };

  router.get('/auth/csrf', csrf.issue);
  router.post('/auth/login', ...signInLimiters(), validate({ body: LoginBody }), signIn);
  router.post('/auth/logout', signOut);
  router.post('/auth/password-reset', mailRequestLimiter(), validate({ body: ResetRequestBody }), async (req, res) => {
    await requestPasswordReset(ctx, parsed(req, 'body', ResetRequestBody).email, linkBase(ctx.config, req));
    res.status(202).json({ message: 'If that address has an account, a reset link is on its way. It expires in 1 hour.' });
  });
  router.get('/auth/password-reset/:token', validate({ params: TokenParams }), async (req, res) => {
    res.json(await checkResetLink(ctx, req.params.token as string));
  });
  router.post('/auth/password-reset/:token', validate({ params: TokenParams, body: ResetBody }), async (req, res) => {
    await resetPassword(ctx, req.params.token as string, parsed(req, 'body', ResetBody).password);
    res.status(204).end();
  });
  return router;
}
