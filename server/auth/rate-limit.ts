/** Failed sign-ins are counted per account and per address; successes are not counted. */
import { rateLimit, type Options } from 'express-rate-limit';
import type { RequestHandler } from 'express';
import { rateLimited } from './errors.ts';

const WINDOW_MS = 15 * 60 * 1000;
export const ACCOUNT_FAILURES_ALLOWED = 5;
const ADDRESS_FAILURES_ALLOWED = 30;
const RESET_REQUESTS_PER_ADDRESS = 10;

const accountKey = (body: unknown): string => {
  const email = (body as { email?: unknown } | undefined)?.email;
  return `account:${typeof email === 'string' ? email.trim().toLowerCase() : ''}`;
};

function limiter(options: Partial<Options>, message: string): RequestHandler {
  return rateLimit({
    windowMs: WINDOW_MS,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(rateLimited(message)),
    ...options,
  });
}

/** [per address, per account]; the account limiter answers the 6th failure within 15 minutes with 429. */
export function signInLimiters(): RequestHandler[] {
  return [
    limiter(
      { limit: ADDRESS_FAILURES_ALLOWED, skipSuccessfulRequests: true, identifier: 'sign-in-address' },
      'Too many failed sign-ins from your address. Wait 15 minutes and try again.',
    ),
    limiter(
      { limit: ACCOUNT_FAILURES_ALLOWED, skipSuccessfulRequests: true, keyGenerator: (req) => accountKey(req.body), identifier: 'sign-in-account' },
      'Too many failed sign-ins for this account. Wait 15 minutes and try again, or reset your password.',
    ),
  ];
}

export function mailRequestLimiter(): RequestHandler {
  return limiter(
    { limit: RESET_REQUESTS_PER_ADDRESS, identifier: 'mail-request' },
    'Too many requests for mail from your address. Wait 15 minutes and try again.',
  );
}
