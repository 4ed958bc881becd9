/**
 * Double-submit CSRF tokens (csrf-csrf) bound to the session id, required on every state-changing request
 * that carries the session cookie. Requests authenticated by an API token carry no ambient credentials,
 * so they skip the check.
 */
import { createHmac } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { doubleCsrf } from 'csrf-csrf';
import { CsrfInvalid } from '../auth/errors.ts';
import { SESSION_COOKIE } from '../auth/session.ts';
import '../auth/types.ts';

export const CSRF_COOKIE = 'lobewise.csrf';
const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/** csrf-csrf reads req.cookies; we have no cookie-parser, and only our own cookie matters. */
function readCsrfCookie(req: Request): void {
  if (req.cookies && typeof req.cookies === 'object') return;
  const jar: Record<string, string> = {};
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const eq = part.indexOf('=');
    if (eq < 0) continue;
    const name = part.slice(0, eq).trim();
    if (name !== CSRF_COOKIE) continue;
    try {
      jar[name] = decodeURIComponent(part.slice(eq + 1).trim());
    } catch {
      /* malformed cookie: treated as absent */
    }
  }
  req.cookies = jar;
}

function hasCookie(req: Request, name: string): boolean {
  return (req.headers.cookie ?? '').split(';').some((part) => part.trim().startsWith(`${name}=`));
}

export interface Csrf {
  protect: RequestHandler;
  /** GET /api/auth/csrf */
  issue: RequestHandler;
}

export function createCsrf(sessionSecret: string): Csrf {
  // A key of its own, derived so that one configured secret is enough.
  const secret = createHmac('sha256', sessionSecret).update('lobewise csrf').digest('hex');
  const { generateCsrfToken, validateRequest } = doubleCsrf({
    getSecret: () => secret,
    getSessionIdentifier: (req) => req.session?.id ?? '',
    cookieName: CSRF_COOKIE,
    cookieOptions: { sameSite: 'lax', path: '/', secure: false, httpOnly: true },
  });
  return {
    protect(req, _res, next) {
      if (SAFE.has(req.method) || req.authVia === 'token') return next();
      // No session cookie, no ambient credentials to abuse: a cookie-less script may POST to public routes.
      if (!hasCookie(req, SESSION_COOKIE)) return next();
      readCsrfCookie(req);
      next(validateRequest(req) ? undefined : CsrfInvalid());
    },
    issue(req, res) {
      readCsrfCookie(req);
      // Touch the session so an anonymous one is saved and its id (which the token is bound to) survives.
      req.session.csrfIssued = true;
      const token = generateCsrfToken(req, res, { cookieOptions: { secure: req.secure } });
      res.set('cache-control', 'no-store').json({ token });
    },
  };
}
