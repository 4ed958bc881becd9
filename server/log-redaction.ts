/**
 * What never reaches the log: session and CSRF cookies (sent and set), credentials, and the one-time tokens
 * that password-reset and invitation links carry in their path.
 */

/** pino redact paths; values are replaced with "[Redacted]". */
export const LOG_REDACT_PATHS = [
  'req.headers.cookie',
  'req.headers.authorization',
  'req.headers["x-csrf-token"]',
  'res.headers["set-cookie"]',
  'res.headers.authorization',
];

/** API routes and client pages whose path segment after the prefix is a secret token. */
const TOKEN_PATHS = [/^(\/api\/auth\/password-reset\/)[^/?#]+/, /^(\/api\/invitations\/)[^/?#]+/, /^(\/reset\/)[^/?#]+/, /^(\/invite\/)[^/?#]+/];

/** The URL with any link token replaced by "[token]". */
export function scrubUrl(url: string): string {
  for (const re of TOKEN_PATHS) if (re.test(url)) return url.replace(re, '$1[token]');
  return url;
}

interface SerializedReq {
  url?: string;
  params?: Record<string, unknown>;
  [key: string]: unknown;
}

/** pino-http `req` serializer (runs on pino's standard one): the URL and a `token` param scrubbed. */
export function scrubRequest(req: SerializedReq): SerializedReq {
  const out: SerializedReq = { ...req };
  if (typeof out.url === 'string') out.url = scrubUrl(out.url);
  if (out.params && 'token' in out.params) out.params = { ...out.params, token: '[token]' };
  return out;
}
