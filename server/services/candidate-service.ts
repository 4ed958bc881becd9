/** Candidates of a study: list, create, read, change, delete. Access goes through the candidate's study. */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Candidate } from '../entities/candidate.ts';
import type { CandidateCreate, CandidatePatch } from '../../shared/schemas/study.ts';
import { audit } from './audit-service.ts';
import { touchStudy } from './study-service.ts';
import { findInStudy, findStudyFor, type StudyNeed } from './study-access.ts';
import { assertSheetOfStudy } from './target-sheet-service.ts';

export async function listCandidates(ctx: AppContext, user: AuthUser, studyId: string): Promise<Candidate[]> {
  await findStudyFor(ctx, user, studyId, 'read');
  return ctx.db.getRepository(Candidate).find({ where: { studyId }, order: { position: 'ASC', createdAt: 'ASC' } });
}

/** Appends a candidate at the end of the study's list. */
export async function createCandidate(ctx: AppContext, user: AuthUser, studyId: string, input: CandidateCreate): Promise<Candidate> {
  await findStudyFor(ctx, user, studyId, 'edit');
  return ctx.db.transaction(async (m) => {
    await assertSheetOfStudy(m, studyId, input.targetSheetId);
    const [{ next }] = (await m.query(
      `SELECT COALESCE(max(position) + 1, 0)::int AS next FROM candidates WHERE study_id = $1`,
      [studyId],
    )) as [{ next: number }];
    const repo = m.getRepository(Candidate);
    const saved = await repo.save(repo.create({ ...input, studyId, createdBy: user.id, position: next }));
    await touchStudy(m, studyId);
    return saved;
  });
}

/** The candidate, if the user may reach its study with `need`; another team's id is a 404. */
export async function candidateFor(ctx: AppContext, user: AuthUser, id: string, need: StudyNeed): Promise<Candidate> {
  const { row } = await findInStudy(ctx, user, 'candidate', need, () => ctx.db.getRepository(Candidate).findOneBy({ id }));
  return row;
}

export async function getCandidate(ctx: AppContext, user: AuthUser, id: string): Promise<Candidate> {
  return candidateFor(ctx, user, id, 'read');
}

export async function patchCandidate(ctx: AppContext, user: AuthUser, id: string, patch: CandidatePatch): Promise<Candidate> {
  const candidate = await candidateFor(ctx, user, id, 'edit');
  return ctx.db.transaction(async (m) => {
    await assertSheetOfStudy(m, candidate.studyId, patch.targetSheetId);
    const saved = await m.getRepository(Candidate).save(Object.assign(candidate, patch));
    await touchStudy(m, candidate.studyId);
    return saved;
  });
}

/** Deletes the candidate; audited. */
export async function deleteCandidate(ctx: AppContext, user: AuthUser, id: string): Promise<void> {
  const candidate = await candidateFor(ctx, user, id, 'edit');
  await ctx.db.transaction(async (m) => {
    await m.getRepository(Candidate).delete({ id });
    await touchStudy(m, candidate.studyId);
    await audit(ctx, user, 'candidate.deleted', { type: 'candidate', id }, { studyId: candidate.studyId, name: candidate.name }, m);
  });
}
