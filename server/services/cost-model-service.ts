/** A study's cost-and-power model: read it, and save it (which re-prices the study's stored sweep designs). */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { StudyCostModel } from '../entities/cost-model.ts';
import type { CostModel, CostModelView } from '../../shared/cost/cost-model.ts';
import { touchStudy } from './study-service.ts';
import { findStudyFor } from './study-access.ts';
import { repriceStudySweeps } from './sweep-pricing.ts';

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

/** Replaces the model (version + 1) and re-prices every sweep of the study in the same transaction. */
export async function putCostModel(ctx: AppContext, user: AuthUser, studyId: string, model: CostModel): Promise<CostModelView> {
  await findStudyFor(ctx, user, studyId, 'edit');
  return ctx.db.transaction(async (m) => {
    // The upsert takes the model row's lock, so concurrent saves get consecutive versions.
    await m.query(
      `INSERT INTO study_cost_models (study_id, model, version, updated_by, updated_at) VALUES ($1, $2::jsonb, 1, $3, now())
       ON CONFLICT (study_id) DO UPDATE SET model = EXCLUDED.model, version = study_cost_models.version + 1,
         updated_by = EXCLUDED.updated_by, updated_at = now()`,
      [studyId, JSON.stringify(model), user.id],
    );
    const row = await m.getRepository(StudyCostModel).findOneByOrFail({ studyId });
    const repricedSweeps = await repriceStudySweeps(m, studyId, { model: row.model, version: row.version });
    await touchStudy(m, studyId);
    return { ...view(studyId, row), repricedSweeps };
  });
}
