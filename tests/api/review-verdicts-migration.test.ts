/** The verdict rename keeps stored answers: 'approved' becomes 'accepted', 'changes_requested' 'sent_back', each kept as a trail answer; down restores them. */
import { describe, expect, it } from 'vitest';
import type { createDataSource } from '../../server/data-source.ts';
import { useOwnDatabase } from '../helpers/own-database.ts';

const DB = 'lobewise_verdicts_migration_check';
const MINE = 'ReviewVerdictsAndJudgedSheet1796166016790';
const { dataSource } = useOwnDatabase(DB);

type Db = ReturnType<typeof createDataSource>;

/** Undoes migrations down to and including `name` (undoing any that came after it too). */
async function downThrough(db: Db, name: string): Promise<void> {
  for (;;) {
    const [last] = (await db.query(`SELECT name FROM migrations ORDER BY id DESC LIMIT 1`)) as { name: string }[];
    await db.undoLastMigration({ transaction: 'each' });
    if (last!.name === name) return;
  }
}

describe('review verdicts in our own words (migration)', () => {
  it('renames stored answers and the audit trail, keeps each as a trail answer, and reverts cleanly', async () => {
    const db = dataSource();
    await db.initialize();
    try {
      await db.runMigrations({ transaction: 'each' });
      await downThrough(db, MINE);
      const [team] = await db.query(`INSERT INTO teams (name) VALUES ('T') RETURNING id`);
      const [eng] = await db.query(`INSERT INTO users (email, name, role, team_id) VALUES ('e@x.test', 'E', 'engineer', $1) RETURNING id`, [team.id]);
      const [rev] = await db.query(`INSERT INTO users (email, name, role, team_id) VALUES ('r@x.test', 'R', 'reviewer', $1) RETURNING id`, [team.id]);
      const [study] = await db.query(`INSERT INTO studies (team_id, owner_id, name) VALUES ($1, $2, 'S') RETURNING id`, [team.id, eng.id]);
      const insert = (state: string, note: string) =>
        db.query(
          `INSERT INTO review_requests (study_id, requested_by_id, reviewer_id, state, note, answered_at) VALUES ($1, $2, $3, $4, $5, CASE WHEN $4 = 'asked' THEN NULL ELSE now() END) RETURNING id`,
          [study.id, eng.id, rev.id, state, note],
        );
      const [ok] = await insert('approved', 'Fine.');
      const [back] = await insert('changes_requested', 'Wider pitch, please.');
      const [open] = await insert('asked', '');
      await db.query(`INSERT INTO audit_events (team_id, actor_id, action, target_type, target_id, details) VALUES ($1, $2, 'review.answered', 'review_request', $3, '{"state":"changes_requested"}')`, [team.id, rev.id, back.id]);

      await db.runMigrations({ transaction: 'each' });
      const states = Object.fromEntries(((await db.query(`SELECT id, state FROM review_requests`)) as { id: string; state: string }[]).map((r) => [r.id, r.state]));
      expect(states).toEqual({ [ok.id]: 'accepted', [back.id]: 'sent_back', [open.id]: 'asked' });
      const answers = (await db.query(`SELECT request_id, verdict, note FROM review_answers ORDER BY verdict`)) as { request_id: string; verdict: string; note: string }[];
      expect(answers).toEqual([
        { request_id: ok.id, verdict: 'accepted', note: 'Fine.' },
        { request_id: back.id, verdict: 'sent_back', note: 'Wider pitch, please.' },
      ]);
      const [audit] = await db.query(`SELECT details FROM audit_events WHERE target_id = $1`, [back.id]);
      expect(audit.details.state).toBe('sent_back');
      // The old words are refused from now on.
      await expect(db.query(`UPDATE review_requests SET state = 'approved' WHERE id = $1`, [open.id])).rejects.toThrow(/review_requests_state_check/);

      await downThrough(db, MINE);
      const reverted = Object.fromEntries(((await db.query(`SELECT id, state FROM review_requests`)) as { id: string; state: string }[]).map((r) => [r.id, r.state]));
      expect(reverted).toEqual({ [ok.id]: 'approved', [back.id]: 'changes_requested', [open.id]: 'asked' });
      const [{ present }] = await db.query(`SELECT to_regclass('public.review_answers') IS NOT NULL AS present`);
      expect(present).toBe(false);
      await db.runMigrations({ transaction: 'each' });
    } finally {
      await db.destroy();
    }
  });
});
