/** Who may pass: requireAuth for any signed-in member (session or API token), requireRole for role-gated routes. */
import type { RequestHandler } from 'express';
import type { TeamRole } from '../entities/user.ts';
import { Forbidden, Unauthenticated } from '../errors.ts';
import '../auth/types.ts';

export const requireAuth: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : Unauthenticated());
};

/** Admin counts as engineer too: admins may do everything engineers may. */
export function requireRole(...roles: TeamRole[]): RequestHandler {
  const allowed = new Set<TeamRole>(roles.includes('engineer') ? [...roles, 'admin'] : roles);
  const why = `this needs the ${roles.join(' or ')} role`;
  return (req, _res, next) => {
    if (!req.user) return next(Unauthenticated());
    next(allowed.has(req.user.role) ? undefined : Forbidden(why));
  };
}

/** req.user after requireAuth, typed without a non-null assertion at every call site. */
export function userOf(req: Express.Request): Express.User {
  if (!req.user) throw Unauthenticated();
  return req.user;
}
