/** A study's cost-and-power model: read it, and save it (which re-prices the study's stored sweep designs). */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { StudyCostModel } from '../entities/cost-model.ts';
import type { CostModel, CostModelView } from '../../shared/cost/cost-model.ts';
import { touchStudy } from './study-service.ts';
import { findStudyFor } from './study-access.ts';
import { INLINE_REPRICE_DESIGNS, repriceStudySweeps, scheduleReprice, storedDesigns } from './sweep-pricing.ts';
import { forgetReadAccess } from './read-access-cache.ts';

function view(studyId: string, row: StudyCostModel | null): CostModelView {
  return {
    studyId,
    model: row?.model ?? null,
    version: row?.version ?? null,
    updatedAt: row?.updatedAt ? row.updatedAt.toISOString() : null,
  };
}

export async function getCostModel(ctx: AppContext, user: AuthUser, studyId: string): Promise<CostModelView> {
  await findStudyFor(ctx, user, studyId, 'read');
  return view(studyId, await ctx.db.getRepository(StudyCostModel).findOneBy({ studyId }));
}

/**
 * Replaces the model (version + 1). Up to `inlineLimit` stored designs are re-priced in the same transaction;
 * beyond it the save commits at once and they are re-priced after it (the designs endpoint says so meanwhile).
 */
export async function putCostModel(
  ctx: AppContext,
  user: AuthUser,
  studyId: string,
  model: CostModel,
  inlineLimit = INLINE_REPRICE_DESIGNS,
): Promise<CostModelView> {
  await findStudyFor(ctx, user, studyId, 'edit');
  const saved = await ctx.db.transaction(async (m) => {
    // The upsert takes the model row's lock, so concurrent saves get consecutive versions.
    await m.query(
      `INSERT INTO study_cost_models (study_id, model, version, updated_by, updated_at) VALUES ($1, $2::jsonb, 1, $3, now())
       ON CONFLICT (study_id) DO UPDATE SET model = EXCLUDED.model, version = study_cost_models.version + 1,
         updated_by = EXCLUDED.updated_by, updated_at = now()`,
      [studyId, JSON.stringify(model), user.id],
    );
    const row = await m.getRepository(StudyCostModel).findOneByOrFail({ studyId });
    const inline = (await storedDesigns(m, studyId)) <= inlineLimit;
    const repricedSweeps = inline ? await repriceStudySweeps(m, studyId, { model: row.model, version: row.version }) : 0;
    await touchStudy(m, studyId);
    return { ...view(studyId, row), repricedSweeps, repricing: !inline };
  });
  forgetReadAccess(ctx.db); // the study's sweeps now answer to a new cost model version
  if (saved.repricing) void scheduleReprice(ctx.db, ctx.log, studyId, true);
  return saved;
}
