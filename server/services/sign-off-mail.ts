/**
 * The e-mail sent when a study is signed off: to its owner and everyone who took part in its review (who asked, who
 * was asked, who commented, who signed an earlier decision), each once; the signer is not mailed about their own act.
 */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import type { Study } from '../entities/study.ts';
import { LIMIT_LABELS, type LimitKey } from '../../shared/targets/sheet.ts';
import type { DecisionView } from './decision-service.ts';

/** E-mail addresses of the owner and the review's participants of `studyId`, without `exceptId`, sorted. */
export async function signOffRecipients(ctx: AppContext, studyId: string, exceptId: string): Promise<string[]> {
  const rows = (await ctx.db.query(
    `SELECT DISTINCT u.email FROM users u
      WHERE u.id <> $2 AND u.id IN (
        SELECT owner_id FROM studies WHERE id = $1
        UNION SELECT requested_by_id FROM review_requests WHERE study_id = $1
        UNION SELECT reviewer_id FROM review_requests WHERE study_id = $1
        UNION SELECT author_id FROM comments WHERE study_id = $1
        UNION SELECT decided_by_id FROM decisions WHERE study_id = $1
      ) ORDER BY u.email`,
    [studyId, exceptId],
  )) as { email: string }[];
  return rows.map((r) => r.email);
}

/** The message text (pure, so its wording is tested on its own). */
export function signOffText(study: Pick<Study, 'id' | 'name'>, signer: string, d: DecisionView, baseUrl: string): string {
  const sheetName = d.targetSheet?.name ? `“${d.targetSheet.name}”` : 'the study’s target sheet';
  const verdict = !d.targetSheet
    ? 'No target sheet was set, so it was not judged against limits.'
    : d.failedLimits.length === 0
      ? `It meets every limit of ${sheetName}.`
      : `It fails these limits of ${sheetName}: ${d.failedLimits.map((k) => LIMIT_LABELS[k as LimitKey] ?? k).join('; ')}.\nWhy it was signed off anyway: ${d.justification}`;
  return [
    `${signer} signed off the study “${study.name}” on ${(d.signedAt ?? d.createdAt).slice(0, 16).replace('T', ' ')} UTC.`,
    '',
    `Chosen design: ${d.label}`,
    verdict,
    d.metrics.basis ? `Worst cases are taken over ${d.metrics.basis}.` : '',
    '',
    `Rationale:\n${d.rationale}`,
    '',
    `The study's review trail: ${baseUrl}/studies/${study.id}#review`,
    `The review packet: ${baseUrl}/studies/${study.id}/packet`,
    '',
  ]
    .filter((line, i, all) => line !== '' || all[i - 1] !== '')
    .join('\n');
}

/** Sends the sign-off mail; a mail failure is logged and never undoes the signature. */
export async function mailSignOff(ctx: AppContext, signer: AuthUser, study: Study, d: DecisionView, baseUrl: string): Promise<void> {
  if (!ctx.mailer) {
    ctx.log.warn({ decisionId: d.id }, 'sign-off not mailed: mail is not configured');
    return;
  }
  const text = signOffText(study, signer.name, d, baseUrl);
  // One message per person: nobody's address is shown to the others, and each outbox holds only its own copy.
  for (const to of await signOffRecipients(ctx, study.id, signer.id)) {
    try {
      await ctx.mailer.send({ to, subject: `Signed off: “${study.name}”`, text, teamId: study.teamId });
    } catch (err) {
      ctx.log.error({ err, decisionId: d.id, to }, 'sign-off e-mail failed');
    }
  }
}
