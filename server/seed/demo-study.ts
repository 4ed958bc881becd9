/**
 * The demo study for `npm start`: an invented scenario in which Kestrel Bay Devices (an invented company) choose
 * between handset antenna modules and a small-cell panel. It has candidates, both target sheets (handset and small cell) and a
 * finished sweep computed here with the engine, so a new user opens a full trade table and charts at once.
 * Idempotent: the study is found by its name in the demo team and nothing is written twice.
 */
import type { AppContext } from '../context.ts';
import { Candidate } from '../entities/candidate.ts';
import { Device } from '../entities/device.ts';
import { Study } from '../entities/study.ts';
import { TargetSheetRow } from '../entities/target-sheet.ts';
import { User } from '../entities/user.ts';
import { designRows, pointRow } from '../sweeps/rows.ts';
import { ENGINE_VERSION } from '../../shared/engine/index.ts';
import { DesignSchema, type DesignInput } from '../../shared/schemas/design.ts';
import { DeviceLayoutSchema } from '../../shared/schemas/device.ts';
import { evaluateRange } from '../../shared/sweep/evaluate-range.ts';
import { compileGrid } from '../../shared/sweep/grid.ts';
import type { SweepGridInput } from '../../shared/sweep/grid-schema.ts';
import { SweepGridShapeSchema } from '../../shared/sweep/grid-schema.ts';
import { HANDSET_28GHZ, SMALL_CELL_39GHZ } from '../../shared/targets/presets.ts';
import { DEMO_COST_MODEL } from '../../shared/cost/demo-cost-model.ts';
import { DEMO_USERS } from './accounts.ts';

export const DEMO_STUDY_NAME = 'Kestrel Bay Devices: handset module or small-cell panel';
export const DEMO_SWEEP_NAME = 'Handset module, 28 GHz: size, pitch, taper and phase bits';

/** Invented candidates of the scenario (every figure made up for the demo). */
const CANDIDATES: { name: string; notes: string; design: DesignInput; sheet: 'handset' | 'smallCell' }[] = [
  {
    name: 'Handset edge module 1×4',
    notes: 'Invented: four patches along the phone edge, one beamformer chip.',
    design: { frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, phaseBits: 6, element: { kind: 'cosine', q: 1.5 }, channelPowerDbm: 10, steerAzDeg: 30 },
    sheet: 'handset',
  },
  {
    name: 'Handset module 2×4, Taylor',
    notes: 'Invented: a taller module trading height for EIRP and lower side lobes.',
    design: {
      frequencyGHz: 28, nx: 4, ny: 2, dxMm: 5.35, taperX: { kind: 'taylor', sllDb: 25, nbar: 4 }, phaseBits: 6,
      element: { kind: 'cosine', q: 1.5 }, channelPowerDbm: 10,
    },
    sheet: 'handset',
  },
  {
    name: 'Small-cell panel 8×8, 39 GHz',
    notes: 'Invented: the street-level panel option, for comparison with the small-cell preset.',
    design: {
      frequencyGHz: 39, nx: 8, ny: 8, dxMm: 3.85, taperX: { kind: 'taylor', sllDb: 25, nbar: 4 }, taperY: { kind: 'taylor', sllDb: 25, nbar: 4 },
      phaseBits: 6, element: { kind: 'tr38901' }, channelPowerDbm: 18,
    },
    // Judged against the small-cell sheet: against the handset sheet every 39 GHz panel fails.
    sheet: 'smallCell',
  },
];

/** Invented devices of the scenario: a phone with edge modules on both long sides, and the street panel. */
function demoDevices(studyId: string, createdBy: string, candidates: Candidate[], sheetIds: { handset: string; smallCell: string }) {
  const [edge, , panel] = candidates;
  return [
    {
      studyId, createdBy, position: 0, name: 'Kestrel phone: two edge modules', targetSheetId: sheetIds.handset,
      notes: 'Invented: the 1×4 edge module on each long side of the phone, each with a 7-beam azimuth codebook.',
      layout: DeviceLayoutSchema.parse({
        outline: { widthMm: 72, heightMm: 150, depthMm: 8 },
        modules: [
          { candidateId: edge!.id, face: 'right', u: 0.5, v: 0.75, codebook: { kind: 'grid', grid: 'az -45:45:15 × el 0' } },
          { candidateId: edge!.id, face: 'left', u: 0.5, v: 0.25, codebook: { kind: 'grid', grid: 'az -45:45:15 × el 0' } },
        ],
      }),
    },
    {
      studyId, createdBy, position: 1, name: 'Street panel 8×8', targetSheetId: sheetIds.smallCell,
      notes: 'Invented: the 39 GHz panel on the front of a pole box, its codebook filling the service sector within 3 dB.',
      layout: DeviceLayoutSchema.parse({
        outline: { widthMm: 200, heightMm: 300, depthMm: 60 },
        modules: [{ candidateId: panel!.id, face: 'front', codebook: { kind: 'fill', crossoverDb: 3, azMinDeg: -50, azMaxDeg: 50, elMinDeg: -10, elMaxDeg: 10 } }],
      }),
    },
  ];
}

/** 96 designs × 7 steering angles = 672 points: small enough to compute at start-up in about a second. */
export const DEMO_GRID: SweepGridInput = {
  frequencyGHz: 28,
  nx: [3, 4, 5, 6],
  ny: [1, 2],
  dxMm: [4.4, 4.8, 5.35],
  taperX: [{ kind: 'uniform' }, { kind: 'taylor', sllDb: 25, nbar: 4 }],
  phaseBits: [4, 6],
  element: { kind: 'cosine', q: 1 },
  channelPowerDbm: 10,
  // Both sides of broadside: the handset sheet asks for coverage of -45° to 45°.
  steerAzDeg: [-45, -30, -15, 0, 15, 30, 45],
};

/** Rows per INSERT, as the sweep writer uses. */
const BATCH_ROWS = 1000;

export async function seedDemoStudy(ctx: AppContext): Promise<{ studyId: string; sweepId: string } | null> {
  const engineer = await ctx.db.getRepository(User).findOneBy({ email: DEMO_USERS.find((u) => u.role === 'engineer')!.email });
  if (!engineer) return null;
  const existing = await ctx.db.getRepository(Study).findOneBy({ teamId: engineer.teamId, name: DEMO_STUDY_NAME });
  if (existing) return null;

  // Computed before the transaction so the lock is held only for the inserts.
  const grid = SweepGridShapeSchema.parse(DEMO_GRID);
  const compiled = compileGrid(grid);
  const points = evaluateRange(compiled, 0, compiled.points);
  const failed = points.filter((p) => p.error !== null).length;

  return ctx.db.transaction(async (m) => {
    const study = await m.getRepository(Study).save({
      teamId: engineer.teamId,
      ownerId: engineer.id,
      name: DEMO_STUDY_NAME,
      description:
        'Invented demo scenario: Kestrel Bay Devices must pick a 28 GHz handset antenna module for their next phone, ' +
        'and weigh it against a 39 GHz small-cell panel. Fewer channels save cost; the target sheet sets the floor.',
      visibility: 'team',
    });
    // Both presets as sheets: the handset one first (the study's default), then the small cell's.
    const sheets = m.getRepository(TargetSheetRow);
    const handset = await sheets.save(sheets.create({ studyId: study.id, preset: HANDSET_28GHZ.id, sheet: HANDSET_28GHZ.sheet, position: 0 }));
    const smallCell = await sheets.save(sheets.create({ studyId: study.id, preset: SMALL_CELL_39GHZ.id, sheet: SMALL_CELL_39GHZ.sheet, position: 1 }));
    const sheetIds = { handset: handset.id, smallCell: smallCell.id };
    const saved = await m.getRepository(Candidate).save(
      CANDIDATES.map((c, position) => ({
        studyId: study.id, name: c.name, notes: c.notes, design: DesignSchema.parse(c.design), createdBy: engineer.id, position,
        targetSheetId: sheetIds[c.sheet],
      })),
    );
    await m.getRepository(Device).save(demoDevices(study.id, engineer.id, saved, sheetIds));

    const [sweep] = (await m.query(
      `INSERT INTO sweeps (study_id, name, grid, constraints, status, points_total, points_done, points_failed, designs_total,
         angles_per_design, chunks_total, engine_version, created_by, started_at, finished_at, target_sheet_id)
       VALUES ($1, $2, $3, '{}', 'done', $4, $4, $5, $6, $7, 1, $8, $9, now(), now(), $10) RETURNING id`,
      [study.id, DEMO_SWEEP_NAME, JSON.stringify(DEMO_GRID), compiled.points, failed, compiled.designs, compiled.anglesPerDesign, ENGINE_VERSION, engineer.id, handset.id],
    )) as { id: string }[];
    const sweepId = sweep!.id;
    // One finished chunk covering every point, so recovery never sees work left to do.
    await m.query(
      `INSERT INTO sweep_chunks (sweep_id, chunk_index, point_start, point_end, status, worker_id, done_at) VALUES ($1, 0, 0, $2, 'done', 'demo-seed', now())`,
      [sweepId, compiled.points],
    );
    const insert = async (table: string, rows: unknown[]) => {
      for (let i = 0; i < rows.length; i += BATCH_ROWS) {
        await m.query(`INSERT INTO ${table} SELECT * FROM jsonb_populate_recordset(NULL::${table}, $1::jsonb)`, [JSON.stringify(rows.slice(i, i + BATCH_ROWS))]);
      }
    };
    await insert('sweep_points', points.map((p) => pointRow(sweepId, p)));
    // The invented demo cost model (shared/cost/demo-cost-model.ts), version 1, and the sweep priced with it.
    await m.query(`INSERT INTO study_cost_models (study_id, model, version, updated_by) VALUES ($1, $2::jsonb, 1, $3)`, [
      study.id,
      JSON.stringify(DEMO_COST_MODEL),
      engineer.id,
    ]);
    await m.query(`UPDATE sweeps SET cost_model_version = 1 WHERE id = $1`, [sweepId]);
    await insert('sweep_designs', designRows(sweepId, points, DEMO_COST_MODEL));
    return { studyId: study.id, sweepId };
  });
}
