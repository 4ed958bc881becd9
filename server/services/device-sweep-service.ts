/**
 * Starting a sweep over a device: one module's candidate varied (the layout, the other modules and every codebook
 * rule fixed), stored like any sweep (a row in `sweeps`, one chunk per variant) and run by the sweep runner on the
 * sweep worker pool, each variant's coverage judged against the device's sheet. Progress, cancel, restart recovery
 * and the results endpoints are the grid sweeps' own (sweep-service.ts, server/sweeps/).
 */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { invalidInput } from '../errors.ts';
import { ENGINE_VERSION } from '../../shared/engine/index.ts';
import type { SweepCreated } from '../../shared/api/sweeps.ts';
import { DesignSchema, type Design } from '../../shared/schemas/design.ts';
import { deviceRegion } from '../../shared/devices/device-region.ts';
import { deviceSweepVariants, type DeviceSweepRequest } from '../../shared/devices/device-sweep.ts';
import { VARIED_MODULE_KEY, type DeviceSweepSpec } from '../../shared/devices/device-sweep-spec.ts';
import { deviceFor, designsOf } from './device-service.ts';
import { resolveElementPatterns } from './element-pattern-service.ts';
import { sheetFor, sheetName } from './target-sheet-service.ts';

/** The module designs of the device, each checked; 400 naming the module whose candidate is gone or unusable. */
function moduleDesigns(layout: DeviceSweepSpec['layout'], stored: Record<string, unknown>, varied: number): Record<string, Design> {
  const out: Record<string, Design> = {};
  for (const [i, m] of layout.modules.entries()) {
    const p = DesignSchema.safeParse(stored[m.candidateId]);
    if (!p.success) throw invalidInput([{ field: `layout.modules[${i}].candidateId`, message: 'names a candidate that is gone or no longer valid' }]);
    // Coverage needs every module's power per channel; the varied one may get it from `vary`.
    if (p.data.channelPowerDbm === null && i !== varied) {
      throw invalidInput([{ field: `layout.modules[${i}].candidateId`, message: 'names a candidate without channelPowerDbm (coverage needs the power per channel)' }]);
    }
    out[m.candidateId] = p.data;
  }
  return out;
}

export async function createDeviceSweep(ctx: AppContext, user: AuthUser, deviceId: string, request: DeviceSweepRequest): Promise<SweepCreated> {
  const { row: device } = await deviceFor(ctx, user, deviceId, 'edit');
  const layout = device.layout;
  const target = layout.modules[request.moduleIndex];
  if (!target) throw invalidInput([{ field: 'moduleIndex', message: `must name a module of the device (0 to ${layout.modules.length - 1})` }]);
  const designs = moduleDesigns(layout, await designsOf(ctx.db.manager, device.studyId, layout), request.moduleIndex);
  // Table elements carry only their pattern id in the study; the threads need the values (the variants keep them).
  const ids = Object.keys(designs);
  const moduleOf = (k: string) => layout.modules.findIndex((m) => m.candidateId === k);
  const resolved = await resolveElementPatterns(ctx, { studyId: device.studyId }, ids.map((k) => designs[k]!), (i) => `layout.modules[${moduleOf(ids[i]!)}].candidateId`);
  const base = resolved[ids.indexOf(target.candidateId)]!;
  let variants;
  try {
    variants = deviceSweepVariants(base, request.vary);
  } catch (err) {
    throw invalidInput([{ field: (err as { field?: string }).field ?? 'vary', message: (err as Error).message }]);
  }
  const unpowered = variants.findIndex((v) => v.design.channelPowerDbm === null);
  if (unpowered >= 0) throw invalidInput([{ field: 'vary.channelPowerDbm', message: `must be given: variant ${unpowered + 1}'s candidate has no power per channel` }]);
  const sheetRow = await sheetFor(ctx.db.manager, device.studyId, device.targetSheetId);
  const sheet = sheetRow?.sheet ?? null;
  const spec: DeviceSweepSpec = {
    deviceId: device.id,
    deviceName: device.name,
    moduleIndex: request.moduleIndex,
    vary: request.vary,
    region: deviceRegion(sheet),
    sheetName: sheetRow ? sheetName(sheetRow) : null,
    layout: { ...layout, modules: layout.modules.map((m, i) => (i === request.moduleIndex ? { ...m, candidateId: VARIED_MODULE_KEY } : m)) },
    designs: { ...Object.fromEntries(ids.map((k, i) => [k, resolved[i]!])), [VARIED_MODULE_KEY]: base },
    sheet,
  };
  const n = variants.length;
  // Modules are M1, M2… in the workspace, as on the Devices tab.
  const name = request.name ?? `${device.name}: M${request.moduleIndex + 1} varied`;
  const id = await ctx.db.transaction(async (m) => {
    const [row] = (await m.query(
      `INSERT INTO sweeps (study_id, name, grid, device, points_total, designs_total, angles_per_design, chunks_total, engine_version, created_by, target_sheet_id)
       VALUES ($1, $2, NULL, $3, $4, $4, 1, $4, $5, $6, $7) RETURNING id`,
      [device.studyId, name, JSON.stringify(spec), n, ENGINE_VERSION, user.id, sheetRow?.id ?? null],
    )) as { id: string }[];
    // One chunk per variant: each is a whole coverage computation, so progress moves variant by variant.
    await m.query(
      `INSERT INTO sweep_chunks (sweep_id, chunk_index, point_start, point_end) SELECT $1, g, g, g + 1 FROM generate_series(0, $2 - 1) AS g`,
      [row!.id, n],
    );
    await m.query(`UPDATE studies SET updated_at = now() WHERE id = $1`, [device.studyId]);
    return row!.id;
  });
  await ctx.sweeps?.kick();
  return { id, pointsTotal: n };
}
