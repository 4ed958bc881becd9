/**
 * The per-app auth machinery: session, passport, bearer tokens, CSRF. app.ts mounts `middleware` before the
 * /api router, and the auth routes use `passport` and `csrf` of the same app (one kit per AppContext object).
 */
import type { RequestHandler } from 'express';
import type { AppContext } from '../context.ts';
import { createCsrf, type Csrf } from '../middleware/csrf.ts';
import { authenticateToken } from '../services/api-token-service.ts';
import { InvalidApiToken } from './errors.ts';
import { createPassport, type Authenticator } from './passport.ts';
import { resolveSessionSecret } from './session-secret.ts';
import { sessionMiddleware } from './session.ts';
import './types.ts';

export interface AuthKit {
  middleware: RequestHandler[];
  passport: Authenticator;
  csrf: Csrf;
}

const BEARER = /^Bearer\s+(\S+)$/i;

/** `Authorization: Bearer <token>` wins over any session cookie on the same request. */
function bearer(ctx: AppContext): RequestHandler {
  return async (req, _res, next) => {
    const match = BEARER.exec(req.headers.authorization ?? '');
    if (!match?.[1]) {
      if (req.user) req.authVia = 'session';
      return next();
    }
    const user = await authenticateToken(ctx, match[1]);
    if (!user) return next(InvalidApiToken());
    req.user = user;
    req.authVia = 'token';
    next();
  };
}

const kits = new WeakMap<AppContext, AuthKit>();

export function authKit(ctx: AppContext): AuthKit {
  let kit = kits.get(ctx);
  if (!kit) {
    const secret = resolveSessionSecret(ctx.config);
    const passport = createPassport(ctx);
    const csrf = createCsrf(secret);
    kit = {
      passport,
      csrf,
      middleware: [sessionMiddleware(ctx, secret), passport.initialize(), passport.session(), bearer(ctx), csrf.protect],
    };
    kits.set(ctx, kit);
  }
  return kit;
}
