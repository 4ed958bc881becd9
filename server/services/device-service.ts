/** Devices of a study: list, create, read, change, delete. Access goes through the device's study. */
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Candidate } from '../entities/candidate.ts';
import { Device } from '../entities/device.ts';
import { invalidInput } from '../errors.ts';
import type { DeviceCreate, DeviceLayout, DevicePatch } from '../../shared/schemas/device.ts';
import { audit } from './audit-service.ts';
import { touchStudy } from './study-service.ts';
import { findInStudy, findStudyFor } from './study-access.ts';
import { assertSheetOfStudy } from './target-sheet-service.ts';

/** 400 naming the module whose candidate is not one of the study's. */
async function assertCandidatesOfStudy(m: EntityManager, studyId: string, layout: DeviceLayout | undefined): Promise<void> {
  if (!layout) return;
  const ids = [...new Set(layout.modules.map((x) => x.candidateId))];
  const rows = (await m.query(`SELECT id FROM candidates WHERE study_id = $1 AND id = ANY($2::uuid[])`, [studyId, ids])) as { id: string }[];
  const known = new Set(rows.map((r) => r.id));
  const bad = layout.modules.findIndex((x) => !known.has(x.candidateId));
  if (bad >= 0) throw invalidInput([{ field: `layout.modules[${bad}].candidateId`, message: 'must be the id of a candidate of this study' }]);
}

export async function listDevices(ctx: AppContext, user: AuthUser, studyId: string): Promise<Device[]> {
  await findStudyFor(ctx, user, studyId, 'read');
  return ctx.db.getRepository(Device).find({ where: { studyId }, order: { position: 'ASC', createdAt: 'ASC' } });
}

/** Appends a device at the end of the study's list. */
export async function createDevice(ctx: AppContext, user: AuthUser, studyId: string, input: DeviceCreate): Promise<Device> {
  await findStudyFor(ctx, user, studyId, 'edit');
  return ctx.db.transaction(async (m) => {
    await assertSheetOfStudy(m, studyId, input.targetSheetId);
    await assertCandidatesOfStudy(m, studyId, input.layout);
    const [{ next }] = (await m.query(`SELECT COALESCE(max(position) + 1, 0)::int AS next FROM devices WHERE study_id = $1`, [studyId])) as [{ next: number }];
    const repo = m.getRepository(Device);
    const saved = await repo.save(repo.create({ ...input, targetSheetId: input.targetSheetId ?? null, studyId, createdBy: user.id, position: next }));
    await touchStudy(m, studyId);
    return saved;
  });
}

/** The device if the user may `need` its study; another team's device is "not found". */
export const deviceFor = (ctx: AppContext, user: AuthUser, id: string, need: 'read' | 'edit') =>
  findInStudy(ctx, user, 'device', need, () => ctx.db.getRepository(Device).findOneBy({ id }));

export async function getDevice(ctx: AppContext, user: AuthUser, id: string): Promise<Device> {
  return (await deviceFor(ctx, user, id, 'read')).row;
}

export async function patchDevice(ctx: AppContext, user: AuthUser, id: string, patch: DevicePatch): Promise<Device> {
  const { row } = await deviceFor(ctx, user, id, 'edit');
  return ctx.db.transaction(async (m) => {
    await assertSheetOfStudy(m, row.studyId, patch.targetSheetId);
    await assertCandidatesOfStudy(m, row.studyId, patch.layout);
    const saved = await m.getRepository(Device).save(Object.assign(row, patch));
    await touchStudy(m, row.studyId);
    return saved;
  });
}

export async function deleteDevice(ctx: AppContext, user: AuthUser, id: string): Promise<void> {
  const { row } = await deviceFor(ctx, user, id, 'edit');
  await ctx.db.transaction(async (m) => {
    await m.getRepository(Device).delete({ id });
    await touchStudy(m, row.studyId);
    await audit(ctx, user, 'device.deleted', { type: 'device', id }, { studyId: row.studyId, name: row.name }, m);
  });
}

/** The candidates' designs a device's modules use, by id (for coverage on the server). */
export async function designsOf(m: EntityManager, studyId: string, layout: DeviceLayout): Promise<Record<string, Candidate['design']>> {
  const rows = await m.getRepository(Candidate).findBy(layout.modules.map((x) => ({ id: x.candidateId, studyId })));
  return Object.fromEntries(rows.map((r) => [r.id, r.design]));
}
