import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { AuditEvent } from '../entities/audit-event.ts';

export interface AuditTarget {
  type: string;
  id: string;
}

export type AuditActor = Pick<AuthUser, 'id' | 'email' | 'teamId'> | null;

/**
 * Records who did what to which target. Call it for sign-ins, role changes, shares, deletions and sign-offs.
 * Pass `manager` to write inside the caller's transaction so the record and the change land together.
 * @param actor the user acting, or null for anonymous events (a failed sign-in)
 * @param action dotted verb, e.g. 'auth.sign_in', 'team.role_changed', 'study.deleted'
 */
export async function audit(
  ctx: AppContext,
  actor: AuditActor,
  action: string,
  target: AuditTarget | null,
  details: Record<string, unknown> = {},
  manager: EntityManager = ctx.db.manager,
): Promise<void> {
  const row: Partial<AuditEvent> = {
    teamId: actor?.teamId ?? (typeof details.teamId === 'string' ? details.teamId : null),
    actorId: actor?.id ?? null,
    actorEmail: actor?.email ?? null,
    action,
    targetType: target?.type ?? null,
    targetId: target?.id ?? null,
    details,
  };
  const repo = manager.getRepository(AuditEvent);
  await repo.save(repo.create(row));
}
