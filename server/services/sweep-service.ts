/**
 * Sweeps of a study: start (rows for the sweep and its chunks; the runner queues them), progress, cancel.
 * Results and CSV live in sweep-results.ts. Access always goes through the study (findStudyFor).
 */
import { aboutDeviceSweep } from '../../shared/devices/device-sweep-spec.ts';
import { ENGINE_VERSION } from '../../shared/engine/index.ts';
import { TARGET_CHUNK_POINTS } from '../../shared/sweep/chunks.ts';
import { GridTooLarge, compileGrid } from '../../shared/sweep/grid.ts';
import type { SweepRequest } from '../../shared/sweep/request.ts';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import type { SweepCreated, SweepProgress as SharedSweepProgress } from '../../shared/api/sweeps.ts';
import { FINISHED_STATUSES, Sweep } from '../entities/sweep.ts';
import { Conflict, invalidInput } from '../errors.ts';
import { findInStudy, findStudyFor, type StudyNeed } from './study-access.ts';
import { resolveGridElements } from './element-pattern-service.ts';
import { assertSheetOfStudy } from './target-sheet-service.ts';

/** A sweep's state as the routes answer it (shared/api/sweeps.ts). */
export type SweepProgress = SharedSweepProgress<Date>;

export function progressOf(s: Sweep, now = Date.now()): SweepProgress {
  const finished = FINISHED_STATUSES.has(s.status);
  const end = finished && s.finishedAt ? s.finishedAt.getTime() : now;
  const seconds = s.startedAt ? Math.max(0.001, (end - s.startedAt.getTime()) / 1000) : null;
  const rate = seconds !== null && s.pointsDone > 0 ? s.pointsDone / seconds : null;
  const eta = finished ? 0 : rate ? (s.pointsTotal - s.pointsDone) / rate : null;
  return {
    id: s.id,
    studyId: s.studyId,
    name: s.name,
    status: s.status,
    pointsTotal: s.pointsTotal,
    pointsDone: s.pointsDone,
    pointsFailed: s.pointsFailed,
    designsTotal: s.designsTotal,
    anglesPerDesign: s.anglesPerDesign,
    ratePerSecond: rate,
    etaSeconds: eta,
    engineVersion: s.engineVersion,
    error: s.error,
    targetSheetId: s.targetSheetId,
    device: s.device ? aboutDeviceSweep(s.device) : null,
    createdAt: s.createdAt,
    startedAt: s.startedAt,
    finishedAt: s.finishedAt,
  };
}

/** Creates the sweep and its chunks; the sweep runner sends them to the queue. 400 when over the limit or empty. */
export async function createSweep(ctx: AppContext, user: AuthUser, studyId: string, body: SweepRequest): Promise<SweepCreated> {
  await findStudyFor(ctx, user, studyId, 'edit');
  // Table elements carry their pattern from here on: the stored grid is exactly what the worker threads evaluate.
  body = { ...body, grid: await resolveGridElements(ctx, studyId, body.grid) };
  let grid;
  try {
    grid = compileGrid(body.grid, body.constraints);
  } catch (err) {
    if (err instanceof GridTooLarge) throw invalidInput([{ field: 'grid', message: err.message }]);
    throw err;
  }
  const limit = ctx.config.SWEEP_POINT_LIMIT;
  if (grid.points > limit) {
    throw invalidInput([
      { field: 'grid', message: `has ${grid.points.toLocaleString('en-US')} points; the limit is ${limit.toLocaleString('en-US')}` },
    ]);
  }
  if (grid.points === 0) throw invalidInput([{ field: 'constraints', message: 'drop every design of the grid; relax them' }]);
  const designsPerChunk = Math.max(1, Math.floor(TARGET_CHUNK_POINTS / grid.anglesPerDesign));
  const chunks = Math.ceil(grid.designs / designsPerChunk);
  const id = await ctx.db.transaction(async (m) => {
    await assertSheetOfStudy(m, studyId, body.targetSheetId);
    const [row] = (await m.query(
      `INSERT INTO sweeps (study_id, name, grid, constraints, points_total, designs_total, angles_per_design, chunks_total, engine_version, created_by, target_sheet_id)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11) RETURNING id`,
      [studyId, body.name, JSON.stringify(body.grid), JSON.stringify(body.constraints), grid.points, grid.designs, grid.anglesPerDesign, chunks, ENGINE_VERSION, user.id, body.targetSheetId],
    )) as { id: string }[];
    // Chunks of whole designs: chunk g holds designs [g·k, (g+1)·k) with k designs per chunk.
    await m.query(
      `INSERT INTO sweep_chunks (sweep_id, chunk_index, point_start, point_end)
       SELECT $1, g, g * $2 * $3, LEAST($4, (g + 1) * $2) * $3 FROM generate_series(0, $5 - 1) AS g`,
      [row!.id, designsPerChunk, grid.anglesPerDesign, grid.designs, chunks],
    );
    await m.query(`UPDATE studies SET updated_at = now() WHERE id = $1`, [studyId]);
    return row!.id;
  });
  await ctx.sweeps?.kick();
  return { id, pointsTotal: grid.points };
}

export async function listSweeps(ctx: AppContext, user: AuthUser, studyId: string): Promise<SweepProgress[]> {
  await findStudyFor(ctx, user, studyId, 'read');
  const rows = await ctx.db.getRepository(Sweep).find({ where: { studyId }, order: { createdAt: 'DESC' } });
  return rows.map((s) => progressOf(s));
}

/** The sweep if the user may `need` its study; another team's sweep is "not found". */
export async function findSweepFor(ctx: AppContext, user: AuthUser, sweepId: string, need: StudyNeed): Promise<Sweep> {
  const { row } = await findInStudy(ctx, user, 'sweep', need, () => ctx.db.getRepository(Sweep).findOneBy({ id: sweepId }));
  return row;
}

export async function getSweep(ctx: AppContext, user: AuthUser, sweepId: string): Promise<SweepProgress> {
  return progressOf(await findSweepFor(ctx, user, sweepId, 'read'));
}

/** Stops a queued or running sweep; results so far stay. 409 when it has already finished. */
export async function cancelSweep(ctx: AppContext, user: AuthUser, sweepId: string): Promise<SweepProgress> {
  await findSweepFor(ctx, user, sweepId, 'edit');
  const res = (await ctx.db.query(
    `UPDATE sweeps SET status = 'cancelled', finished_at = now(), updated_at = now() WHERE id = $1 AND status IN ('queued', 'running')`,
    [sweepId],
  )) as [unknown[], number];
  const sweep = await ctx.db.getRepository(Sweep).findOneByOrFail({ id: sweepId });
  if (res[1] === 0) throw Conflict(`the sweep has already finished (${sweep.status})`);
  return progressOf(sweep);
}
