/** Errors the account features throw, each with its own code so the client can react to it. */
import { ApiError, createError } from '../errors.ts';

export const InvalidCredentials = createError('invalid_credentials', 401, () => 'The e-mail or password is wrong.');
export const InvalidApiToken = createError('invalid_token', 401, () => 'The API token is unknown or has been revoked.');
export const CsrfInvalid = createError(
  'csrf_invalid',
  403,
  () => 'The form token (x-csrf-token) is missing or stale; fetch a new one from GET /api/auth/csrf.',
);
export const LinkExpired = createError('link_expired', 410, (what: string) => `This ${what} link has expired; ask for a new one.`);
export const LinkUsed = createError('link_used', 410, (what: string) => `This ${what} link has already been used; ask for a new one.`);
export const LinkUnknown = createError('link_unknown', 404, (what: string) => `This ${what} link is not valid; check that it was copied whole.`);
export const MailUnavailable = createError('mail_unavailable', 503, () => 'Mail is not configured on this server.');

export function rateLimited(message: string): ApiError {
  return new ApiError(429, 'rate_limited', message);
}

/** 400 on one field, for rules zod cannot see (membership, current password). */
export function fieldError(field: string, message: string): ApiError {
  return new ApiError(400, 'invalid_input', `${field}: ${message}`, [{ field, message }]);
}
