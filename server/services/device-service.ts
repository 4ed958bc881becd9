/** Devices of a study: list, create, read, change, delete. Access goes through the device's study. */
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Candidate } from '../entities/candidate.ts';
import { Device } from '../entities/device.ts';
import { invalidInput } from '../errors.ts';
import type { DeviceCreate, DeviceLayout, DevicePatch } from '../../shared/schemas/device.ts';
import { DesignSchema, type Design } from '../../shared/schemas/design.ts';
import { deviceRegion } from '../../shared/devices/device-region.ts';
import type { DeviceSweepAnswer } from '../../shared/api/devices.ts';
import { deviceSweepVariants, type DeviceSweepRequest } from '../../shared/devices/device-sweep.ts';
import { runDeviceVariant } from '../devices/device-sweep-pool.ts';
import { resolveElementPatterns } from './element-pattern-service.ts';
import { audit } from './audit-service.ts';
import { touchStudy } from './study-service.ts';
import { findInStudy, findStudyFor } from './study-access.ts';
import { assertSheetOfStudy, sheetFor, sheetName } from './target-sheet-service.ts';

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

const deviceFor = (ctx: AppContext, user: AuthUser, id: string, need: 'read' | 'edit') =>
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

/**
 * A sweep over the device: every variant of one module's candidate (values from `request.vary`), each variant's
 * coverage on the device-sweep thread pool, judged against the device's sheet. Rows in variant order.
 */
export async function sweepDevice(ctx: AppContext, user: AuthUser, id: string, request: DeviceSweepRequest, signal?: AbortSignal): Promise<DeviceSweepResult> {
  const { row } = await deviceFor(ctx, user, id, 'read');
  const layout = row.layout;
  const target = layout.modules[request.moduleIndex];
  if (!target) throw invalidInput([{ field: 'moduleIndex', message: `must name a module of the device (0 to ${layout.modules.length - 1})` }]);
  const sheetRow = await sheetFor(ctx.db.manager, row.studyId, row.targetSheetId);
  const sheet = sheetRow?.sheet ?? null;
  const stored = await designsOf(ctx.db.manager, row.studyId, layout);
  const parsed: Record<string, Design> = {};
  for (const [i, m] of layout.modules.entries()) {
    const p = DesignSchema.safeParse(stored[m.candidateId]);
    if (!p.success) throw invalidInput([{ field: `layout.modules[${i}].candidateId`, message: 'names a candidate that is gone or no longer valid' }]);
    parsed[m.candidateId] = p.data;
  }
  for (const [i, m] of layout.modules.entries()) {
    if (parsed[m.candidateId]!.channelPowerDbm === null && i !== request.moduleIndex) {
      throw invalidInput([{ field: `layout.modules[${i}].candidateId`, message: 'names a candidate without channelPowerDbm (coverage needs the power per channel)' }]);
    }
  }
  let variants;
  try {
    variants = deviceSweepVariants(parsed[target.candidateId]!, request.vary);
  } catch (err) {
    throw invalidInput([{ field: (err as { field?: string }).field ?? 'vary', message: (err as Error).message }]);
  }
  // Table elements carry only their pattern id in the study; the threads need the values.
  const baseDesigns = await resolveElementPatterns(ctx, { studyId: row.studyId }, Object.values(parsed));
  const resolved = Object.fromEntries(Object.keys(parsed).map((k, i) => [k, baseDesigns[i]!]));
  const variantDesigns = await resolveElementPatterns(ctx, { studyId: row.studyId }, variants.map((v) => v.design));
  // The varied module gets its own key, so other modules using the same candidate stay as they are.
  const VARIANT = '00000000-0000-4000-8000-00000000ffff';
  const variantLayout = { ...layout, modules: layout.modules.map((m, i) => (i === request.moduleIndex ? { ...m, candidateId: VARIANT } : m)) };
  for (const [index, v] of variants.entries()) {
    if (v.design.channelPowerDbm === null) {
      throw invalidInput([{ field: 'vary.channelPowerDbm', message: `must be given: variant ${index + 1}'s candidate has no power per channel` }]);
    }
  }
  const rows = await Promise.all(
    variants.map((v, index) =>
      runDeviceVariant({ index, params: v.params, input: { layout: variantLayout, designs: { ...resolved, [VARIANT]: variantDesigns[index]! }, sheet } }, signal).catch(
        (err: unknown) => {
          // The engine's own "field: rule" (a variant the coverage schema refuses) is the caller's input, not a fault.
          const m = /^([\w.[\]]+): (.+)$/.exec(err instanceof Error ? err.message : '');
          throw m ? invalidInput([{ field: m[1]!.replace(`layout.modules[${request.moduleIndex}]`, 'vary'), message: `${m[2]} (variant ${index + 1})` }]) : err;
        },
      ),
    ),
  );
  return { deviceId: row.id, moduleIndex: request.moduleIndex, sheetName: sheetRow ? sheetName(sheetRow) : null, region: deviceRegion(sheet).kind, rows };
}

/** POST /api/devices/:id/sweep answers the shape the client reads (shared/api/devices.ts). */
export type DeviceSweepResult = DeviceSweepAnswer;
