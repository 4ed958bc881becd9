import { hashToken, newToken } from '../auth/tokens.ts';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { ApiToken } from '../entities/api-token.ts';
import { NotFound } from '../errors.ts';
import { audit } from './audit-service.ts';
import { findAuthUser } from './user-service.ts';

export const API_TOKEN_PREFIX = 'lw_';

export interface ApiTokenView {
  id: string;
  name: string;
  prefix: string;
  lastUsedAt: Date | null;
  createdAt: Date;
}

const view = (t: ApiToken): ApiTokenView => ({ id: t.id, name: t.name, prefix: t.prefix, lastUsedAt: t.lastUsedAt, createdAt: t.createdAt });

export async function listTokens(ctx: AppContext, user: AuthUser): Promise<ApiTokenView[]> {
  const rows = await ctx.db.getRepository(ApiToken).find({ where: { userId: user.id }, order: { createdAt: 'DESC' } });
  return rows.map(view);
}

/** Creates a token; the plain value is in the answer only, never stored. */
export async function createToken(ctx: AppContext, user: AuthUser, name: string): Promise<ApiTokenView & { token: string }> {
  const { token, hash } = newToken(API_TOKEN_PREFIX);
  const row = await ctx.db.getRepository(ApiToken).save({ userId: user.id, name, tokenHash: hash, prefix: token.slice(0, 10) });
  await audit(ctx, user, 'account.token_created', { type: 'api_token', id: row.id }, { name });
  return { ...view(row), token };
}

export async function revokeToken(ctx: AppContext, user: AuthUser, tokenId: string): Promise<void> {
  const res = await ctx.db.getRepository(ApiToken).delete({ id: tokenId, userId: user.id });
  if (!res.affected) throw NotFound('API token');
  await audit(ctx, user, 'account.token_revoked', { type: 'api_token', id: tokenId });
}

/** The user a bearer token belongs to, or null when it is unknown or revoked. */
export async function authenticateToken(ctx: AppContext, token: string): Promise<AuthUser | null> {
  const repo = ctx.db.getRepository(ApiToken);
  const row = await repo.findOneBy({ tokenHash: hashToken(token) });
  if (!row) return null;
  await repo.update({ id: row.id }, { lastUsedAt: new Date() });
  return findAuthUser(ctx, row.userId);
}
