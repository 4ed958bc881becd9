/**
 * Demo range data: three turntable cuts of the demo's 1×4 handset candidate, steered to 0°, 30° and 60°, so a
 * new user sees the measured-versus-model comparison at once. The "measurements" are invented: the model cut
 * with a seeded 0.4 dB ripple, a 1° turntable offset and a -38 dB noise floor, never a real range.
 */
import { patternCut } from '../../shared/engine/index.ts';
import { RangeUploadFieldsSchema } from '../../shared/bench/api-schemas.ts';
import { gaussian, mulberry32 } from '../../shared/bench/random.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Candidate } from '../entities/candidate.ts';
import { Study } from '../entities/study.ts';
import { User } from '../entities/user.ts';
import { createRangeUpload } from '../services/range-data-service.ts';

const STEERS_DEG = [0, 30, 60];
const SET_NAME = 'Bench module A, turntable run 1 (invented demo data)';
const PEAK_DBM = -31.5;
const FLOOR_DB = -38;
const TURNTABLE_OFFSET_DEG = 1;

function inventedCut(design: ReturnType<typeof DesignSchema.parse>, seed: number): string {
  const { anglesDeg, powerDb } = patternCut(design, 'az', { throughDeg: 0, stepDeg: 1 });
  const noise = gaussian(mulberry32(seed));
  const lines = ['angle_deg,power_dbm'];
  for (let i = 0; i < anglesDeg.length; i++) {
    const level = Math.max(powerDb[i]!, FLOOR_DB) + 0.4 * noise();
    lines.push(`${(anglesDeg[i]! + TURNTABLE_OFFSET_DEG).toFixed(1)},${(PEAK_DBM + level).toFixed(2)}`);
  }
  return `${lines.join('\n')}\n`;
}

/** Adds the three demo cuts to the demo study's first candidate; call only right after that study is created. */
export async function seedDemoRangeData(ctx: AppContext, studyId: string): Promise<void> {
  const study = await ctx.db.getRepository(Study).findOneBy({ id: studyId });
  const candidate = await ctx.db.getRepository(Candidate).findOne({ where: { studyId }, order: { position: 'ASC' } });
  const user = study ? await ctx.db.getRepository(User).findOneBy({ id: study.ownerId }) : null;
  if (!candidate || !user) return;
  const actor: AuthUser = { id: user.id, email: user.email, name: user.name, role: user.role, teamId: user.teamId };
  for (const [i, steer] of STEERS_DEG.entries()) {
    const design = DesignSchema.parse({ ...(candidate.design as object), steerAzDeg: steer, steerElDeg: 0, codes: null });
    const csv = inventedCut(design, 20261201 + i);
    const fields = RangeUploadFieldsSchema.parse({ azDeg: String(steer), elDeg: '0', setName: SET_NAME });
    await createRangeUpload(ctx, actor, candidate.id, fields, { originalname: `module-a-az${steer}.csv`, buffer: Buffer.from(csv) });
  }
}
