import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Review verdicts in our own words: a request's answer is 'accepted' or 'sent_back' (stored rows and the audit trail's
 * answers are renamed). Decisions record what they were judged against: the target sheet's id and a frozen copy of it,
 * the limits the design failed when it was signed, and the written justification for signing it anyway.
 * Every answer is kept in review_answers (a request answered twice, sent back then accepted, keeps both), filled from
 * the requests' current answers. Adding columns does not touch signed rows, so the immutability trigger stays as it is.
 */
export class ReviewVerdictsAndJudgedSheet1796166016790 implements MigrationInterface {
  name = 'ReviewVerdictsAndJudgedSheet1796166016790';

  async up(q: QueryRunner): Promise<void> {
    await this.renameStates(q, { approved: 'accepted', changes_requested: 'sent_back' }, ['asked', 'accepted', 'sent_back']);
    // No foreign key: the sheet may be edited or removed later; the frozen copy is what the decision was judged by.
    await q.query(`ALTER TABLE decisions ADD COLUMN target_sheet_id uuid`);
    await q.query(`ALTER TABLE decisions ADD COLUMN target_sheet jsonb`);
    await q.query(`ALTER TABLE decisions ADD COLUMN failed_limits text[] NOT NULL DEFAULT '{}'`);
    await q.query(`ALTER TABLE decisions ADD COLUMN justification text NOT NULL DEFAULT '' CHECK (length(justification) <= 5000)`);
    await q.query(`CREATE TABLE review_answers (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      request_id uuid NOT NULL REFERENCES review_requests(id) ON DELETE CASCADE,
      study_id uuid NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
      reviewer_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      verdict text NOT NULL CHECK (verdict IN ('accepted', 'sent_back')),
      note text NOT NULL DEFAULT '' CHECK (length(note) <= 5000),
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX review_answers_study_id_idx ON review_answers (study_id, created_at)`);
    await q.query(`INSERT INTO review_answers (request_id, study_id, reviewer_id, verdict, note, created_at)
      SELECT id, study_id, reviewer_id, state, note, coalesce(answered_at, updated_at) FROM review_requests WHERE state <> 'asked'`);
    await q.query(`CREATE INDEX review_requests_reviewer_open_idx ON review_requests (reviewer_id, created_at) WHERE state = 'asked'`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX review_requests_reviewer_open_idx`);
    await q.query(`DROP TABLE review_answers`);
    for (const c of ['justification', 'failed_limits', 'target_sheet', 'target_sheet_id']) await q.query(`ALTER TABLE decisions DROP COLUMN ${c}`);
    await this.renameStates(q, { accepted: 'approved', sent_back: 'changes_requested' }, ['asked', 'approved', 'changes_requested']);
  }

  private async renameStates(q: QueryRunner, names: Record<string, string>, allowed: string[]): Promise<void> {
    await q.query(`ALTER TABLE review_requests DROP CONSTRAINT review_requests_state_check`);
    for (const [from, to] of Object.entries(names)) {
      await q.query(`UPDATE review_requests SET state = $2 WHERE state = $1`, [from, to]);
      await q.query(
        `UPDATE audit_events SET details = jsonb_set(details, '{state}', to_jsonb($2::text))
          WHERE action = 'review.answered' AND details->>'state' = $1`,
        [from, to],
      );
    }
    await q.query(`ALTER TABLE review_requests ADD CONSTRAINT review_requests_state_check CHECK (state IN (${allowed.map((s) => `'${s}'`).join(', ')}))`);
  }
}
