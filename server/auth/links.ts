/** Where links in mail point. PUBLIC_URL wins; without it only a loopback Host header is trusted. */
import type { Request } from 'express';
import type { Config } from '../config.ts';

const LOOPBACK = /^(localhost|127\.0\.0\.1|\[::1\])(:\d+)?$/;

export function linkBase(config: Pick<Config, 'PUBLIC_URL' | 'HOST' | 'PORT'>, req: Request): string {
  if (config.PUBLIC_URL) return config.PUBLIC_URL.replace(/\/+$/, '');
  // A forged Host header must not turn a reset link into a link to someone else's site.
  const host = req.get('host') ?? '';
  return LOOPBACK.test(host) ? `${req.protocol}://${host}` : `http://${config.HOST}:${config.PORT}`;
}
