/**
 * A coverage request: modules placed on a device (a design, a face, a beam codebook), the region of
 * directions to judge and the EIRP percentiles to report. The same schema drives the CLI, the API and
 * the devices page's worker, so a bad body names the same "field: rule" everywhere.
 */
import { z } from 'zod';
import { autoStepDeg } from '../coverage/auto-step-deg.ts';
import { parseGridSpec } from '../coverage/grid-codebook.ts';
import { DesignSchema } from './design.ts';

/** Faces a module can sit on; see shared/coverage/module-frame.ts for the axes of each. */
export const ORIENTATIONS = ['front', 'back', 'right', 'left', 'top', 'bottom'] as const;
export type Orientation = (typeof ORIENTATIONS)[number];

export const MAX_MODULES = 8;
export const MAX_BEAMS_PER_MODULE = 128;
export const MAX_BEAMS = 256;
/** Most beams a fill rule may choose for one module. */
export const MAX_FILL_BEAMS = MAX_BEAMS_PER_MODULE;
export const MAX_PERCENTILES = 32;
/** Sampling steps (degrees) a request may choose; without one, autoStepDeg picks it from the beamwidths. */
export const MIN_STEP_DEG = 0.25;
export const MAX_STEP_DEG = 5;
/**
 * Work one request may ask for, in directions × beams × (elements + 8): a beam's gain costs up to one term per
 * element (quantised phases rarely separate into rows and columns). About 7 ns a unit on this project's machine,
 * so the limit keeps one computation to a few seconds on one thread; the reference handset is 6 million units.
 */
export const MAX_WORK = 1_000_000_000;
/** The fill search costs about this many full samplings of its region with MAX_FILL_BEAMS beams (measured: under 4). */
const FILL_TRIALS = 6;

const beamCost = (d: { nx: number; ny: number }) => d.nx * d.ny + 8;

const steer = (what: string) =>
  z
    .number({ error: `must be a number from -90 to 90 (degrees, ${what} in the module's own frame)` })
    .min(-90, `must be a number from -90 to 90 (degrees, ${what} in the module's own frame)`)
    .max(90, `must be a number from -90 to 90 (degrees, ${what} in the module's own frame)`);

export const BeamSchema = z.object({ azDeg: steer('azimuth'), elDeg: steer('elevation') }, { error: 'must be a beam {azDeg, elDeg}' }).strict();
export type Beam = z.output<typeof BeamSchema>;

const azLimit = z
  .number({ error: 'must be a number from -180 to 180 (degrees, device frame)' })
  .min(-180, 'must be a number from -180 to 180 (degrees, device frame)')
  .max(180, 'must be a number from -180 to 180 (degrees, device frame)');
const elLimit = z
  .number({ error: 'must be a number from -90 to 90 (degrees, device frame)' })
  .min(-90, 'must be a number from -90 to 90 (degrees, device frame)')
  .max(90, 'must be a number from -90 to 90 (degrees, device frame)');

export const RegionSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('sphere') }).strict(),
    z
      .object({ kind: z.literal('sector'), azMinDeg: azLimit, azMaxDeg: azLimit, elMinDeg: elLimit, elMaxDeg: elLimit })
      .strict()
      .superRefine((r, ctx) => {
        if (!(r.azMaxDeg > r.azMinDeg)) ctx.addIssue({ code: 'custom', path: ['azMaxDeg'], message: 'must be greater than azMinDeg' });
        if (!(r.elMaxDeg > r.elMinDeg)) ctx.addIssue({ code: 'custom', path: ['elMaxDeg'], message: 'must be greater than elMinDeg' });
      }),
  ],
  { error: 'must be a region: {kind: "sphere"} or {kind: "sector", azMinDeg, azMaxDeg, elMinDeg, elMaxDeg}' },
);
export type Region = z.output<typeof RegionSchema>;

const BEAMS_RULE =
  'must be an array of beams {azDeg, elDeg}, a grid {grid: "az START:STOP:STEP × el START:STOP:STEP"} or a fill rule {fill: {region, crossoverDb}}';

const BeamListSchema = z
  .array(BeamSchema, { error: BEAMS_RULE })
  .min(1, 'must hold at least one beam')
  .max(MAX_BEAMS_PER_MODULE, `must hold at most ${MAX_BEAMS_PER_MODULE} beams`);

/** A codebook written as a grid spec; expands to its beam list, so the engine only ever sees lists. */
export const GridCodebookSchema = z
  .object({ grid: z.string({ error: 'must be a grid spec "az START:STOP:STEP × el START:STOP:STEP"' }).max(200, 'must be at most 200 characters') }, { error: BEAMS_RULE })
  .strict()
  .transform((g, ctx) => {
    const r = parseGridSpec(g.grid);
    if ('beams' in r) return r.beams;
    ctx.addIssue({ code: 'custom', path: ['grid'], message: r.problem });
    return z.NEVER;
  });

const crossoverRule = 'must be a number from 0.1 to 30 (dB below the codebook\'s peak)';

/**
 * "Fill the region": the fewest beams on a sine-space grid whose best beam stays within crossoverDb of the
 * codebook's peak over `region` (the module's own frame; a sphere means its front hemisphere). Expanded by
 * computeCoverage, on the worker that runs it, since the search takes longer than a request parse should.
 */
export const FillCodebookSchema = z
  .object(
    {
      fill: z
        .object(
          { region: RegionSchema, crossoverDb: z.number({ error: crossoverRule }).min(0.1, crossoverRule).max(30, crossoverRule) },
          { error: 'must be {region, crossoverDb}' },
        )
        .strict(),
    },
    { error: BEAMS_RULE },
  )
  .strict();
export type FillCodebook = z.output<typeof FillCodebookSchema>;

export const CoverageModuleSchema = z
  .object(
    {
      design: DesignSchema,
      orientation: z.enum(ORIENTATIONS, { error: `must be one of ${ORIENTATIONS.map((o) => `"${o}"`).join(', ')}` }),
      beams: z.union([BeamListSchema, GridCodebookSchema, FillCodebookSchema], { error: BEAMS_RULE }),
    },
    { error: 'must be a module {design, orientation, beams}' },
  )
  .strict()
  .superRefine((m, ctx) => {
    if (m.design.channelPowerDbm === null) {
      ctx.addIssue({ code: 'custom', path: ['design', 'channelPowerDbm'], message: 'must be set for coverage (EIRP needs the power per channel)' });
    }
    if (m.design.codes !== null) {
      ctx.addIssue({ code: 'custom', path: ['design', 'codes'], message: 'must be null in a module (its beams set the phases)' });
    }
    if (!Array.isArray(m.beams)) return;
    m.beams.forEach((b, i) => {
      if (m.design.grouping === 'column' && b.elDeg !== 0) {
        ctx.addIssue({ code: 'custom', path: ['beams', i, 'elDeg'], message: 'must be 0 with column grouping (columns steer in azimuth only)' });
      }
      if (m.design.grouping === 'row' && b.azDeg !== 0) {
        ctx.addIssue({ code: 'custom', path: ['beams', i, 'azDeg'], message: 'must be 0 with row grouping (rows steer in elevation only)' });
      }
    });
  });
export type CoverageModule = z.output<typeof CoverageModuleSchema>;
/** A module whose codebook is a beam list (a fill rule expanded). */
export type ResolvedModule = Omit<CoverageModule, 'beams'> & { beams: Beam[] };


const percentile = z
  .number({ error: 'must be a number from 0 to 100 (percent of the region\'s solid angle)' })
  .min(0, 'must be a number from 0 to 100 (percent of the region\'s solid angle)')
  .max(100, 'must be a number from 0 to 100 (percent of the region\'s solid angle)');

/** Directions the sampling grid holds for a region and step (cells of stepDeg × stepDeg, edges snapped). */
export function gridCells(region: Region, stepDeg: number): { az: number; el: number } {
  const azSpan = region.kind === 'sphere' ? 360 : region.azMaxDeg - region.azMinDeg;
  const elSpan = region.kind === 'sphere' ? 180 : region.elMaxDeg - region.elMinDeg;
  return { az: Math.max(1, Math.ceil(azSpan / stepDeg - 1e-9)), el: Math.max(1, Math.ceil(elSpan / stepDeg - 1e-9)) };
}

export const CoverageRequestSchema = z
  .object(
    {
      modules: z
        .array(CoverageModuleSchema, { error: 'must be an array of modules {design, orientation, beams}' })
        .min(1, 'must hold at least one module')
        .max(MAX_MODULES, `must hold at most ${MAX_MODULES} modules`),
      region: RegionSchema,
      percentiles: z
        .array(percentile, { error: 'must be an array of percentiles (0 to 100)' })
        .max(MAX_PERCENTILES, `must hold at most ${MAX_PERCENTILES} percentiles`)
        .default([50]),
      stepDeg: z
        .number({ error: `must be a number from ${MIN_STEP_DEG} to ${MAX_STEP_DEG} (degrees between samples)` })
        .min(MIN_STEP_DEG, `must be a number from ${MIN_STEP_DEG} to ${MAX_STEP_DEG} (degrees between samples)`)
        .max(MAX_STEP_DEG, `must be a number from ${MIN_STEP_DEG} to ${MAX_STEP_DEG} (degrees between samples)`)
        .optional(),
    },
    { error: 'must be a coverage request {modules, region, percentiles}' },
  )
  .strict()
  .superRefine((r, ctx) => {
    // Listed beams only: a fill rule's count is known once it has run (at most MAX_FILL_BEAMS; the work estimate covers it).
    const beams = r.modules.reduce((s, m) => s + (Array.isArray(m.beams) ? m.beams.length : 0), 0);
    if (beams > MAX_BEAMS) ctx.addIssue({ code: 'custom', path: ['modules'], message: `must hold at most ${MAX_BEAMS} beams in all (got ${beams})` });
    const cells = gridCells(r.region, r.stepDeg ?? autoStepDeg(r.modules.map((m) => m.design)));
    let work = 0;
    r.modules.forEach((m) => {
      const n = Array.isArray(m.beams) ? m.beams.length : MAX_FILL_BEAMS;
      work += cells.az * cells.el * n * beamCost(m.design);
      if (!Array.isArray(m.beams)) {
        const fill = gridCells(m.beams.fill.region, autoStepDeg([m.design]));
        work += fill.az * fill.el * MAX_FILL_BEAMS * beamCost(m.design) * FILL_TRIALS;
      }
    });
    if (work > MAX_WORK) {
      const why = `is too much work (${(work / 1e9).toFixed(1)} × 10⁹ units of directions × beams × elements; at most ${MAX_WORK / 1e9} × 10⁹)`;
      const advice = r.stepDeg === undefined ? ': use fewer beams or smaller modules, or set a coarser stepDeg' : ': choose a coarser step, fewer beams or smaller modules';
      ctx.addIssue({ code: 'custom', path: [r.stepDeg === undefined ? 'modules' : 'stepDeg'], message: why + advice });
    }
  });
export type CoverageRequest = z.input<typeof CoverageRequestSchema>;
export type CoverageInput = z.output<typeof CoverageRequestSchema>;
