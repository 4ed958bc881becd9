import { beforeEach, describe, expect, it } from 'vitest';
import { studyReviewState } from '../../server/services/review-request-service.ts';
import { authed, linkIn, seedTeam, seedUser, type AuthedClient } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';
import { createStudy, EDGE_MODULE } from './review-fixtures.ts';

const api = useApiTest({ mail: true, team: 'Kestrel Bay Arrays', signIn: ['engineer', 'reviewer'] });
let studyId: string;

beforeEach(async () => {
  studyId = await createStudy(api.engineer, 'Harbor Point edge module');
});

const ask = (client: AuthedClient, reviewerIds: string[], message = 'Please check the edge EIRP.') =>
  client.post(`/api/studies/${studyId}/review-requests`).send({ reviewerIds, message });

describe('POST /api/studies/:id/review-requests', () => {
  it('asks a reviewer, who gets an e-mail at the fake SMTP server with a link to the study', async () => {
    const res = await ask(api.engineer, [api.team.reviewer.id]);
    expect(res.status).toBe(201);
    expect(res.body).toHaveLength(1);
    expect(res.body[0]).toMatchObject({ state: 'asked', reviewer: { id: api.team.reviewer.id }, requestedBy: { id: api.team.engineer.id } });
    const message = await api.mail.latestTo(api.team.reviewer.email);
    expect(message.subject).toContain('Harbor Point edge module');
    expect(message.textBody).toContain('Please check the edge EIRP.');
    const { url } = linkIn(message.textBody, `/studies/${studyId}`);
    expect(new URL(url).hash).toBe('#review');
    expect(new URL(url).searchParams.get('request')).toBe(res.body[0].id);
  });

  it('asks several reviewers at once, each mailed, and does not ask twice while a request is open', async () => {
    const second = await seedUser(api.ctx.db, api.team.team.id, 'reviewer');
    expect((await ask(api.engineer, [api.team.reviewer.id, second.id])).body).toHaveLength(2);
    await api.mail.latestTo(second.email);
    expect((await ask(api.engineer, [api.team.reviewer.id])).body).toHaveLength(0);
    expect((await api.ctx.db.query(`SELECT id FROM review_requests`)).length).toBe(2);
  });

  it('answers 400 naming the entry when someone named is not a reviewer of the team', async () => {
    const other = await seedTeam(api.ctx.db, 'Other Co');
    for (const id of [api.team.engineer.id, other.reviewer.id]) {
      const res = await ask(api.engineer, [api.team.reviewer.id, id]);
      expect(res.status).toBe(400);
      expect(res.body.error.message).toBe('reviewerIds[1]: must be a reviewer of your team');
    }
    expect((await ask(api.engineer, [])).body.error.fields[0].field).toBe('reviewerIds');
  });

  it('is for engineers and admins: a reviewer gets 403, another team 404', async () => {
    expect((await ask(api.reviewer, [api.team.reviewer.id])).status).toBe(403);
    const other = await seedTeam(api.ctx.db, 'Other Co');
    const outsider = await authed(api.app, other.engineer);
    expect((await ask(outsider, [other.reviewer.id])).status).toBe(404);
    expect((await outsider.get(`/api/studies/${studyId}/review`)).status).toBe(404);
  });
});

describe('answers and the study state', () => {
  it('goes draft → in review → sent back → in review → signed off', async () => {
    const state = async () => (await api.engineer.get(`/api/studies/${studyId}/review`)).body;
    expect((await state()).state).toBe('draft');
    const [request] = (await ask(api.engineer, [api.team.reviewer.id])).body;
    expect(await state()).toMatchObject({ state: 'in_review', asked: 1, answered: 0 });

    const noNote = await api.reviewer.post(`/api/review-requests/${request.id}/answer`).send({ state: 'sent_back' });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.fields[0].field).toBe('note');

    const changes = await api.reviewer.post(`/api/review-requests/${request.id}/answer`).send({ state: 'sent_back', note: 'Add a 10-element option.' });
    expect(changes.status).toBe(200);
    expect(await state()).toMatchObject({ state: 'sent_back', asked: 1, answered: 1 });
    const back = await api.mail.latestTo(api.team.engineer.email);
    expect(back.textBody).toContain('Add a 10-element option.');

    const again = await api.reviewer.post(`/api/review-requests/${request.id}/answer`).send({ state: 'accepted' });
    expect(again.status).toBe(200);
    expect((await state()).state).toBe('in_review');

    const signed = await api.reviewer.post(`/api/studies/${studyId}/decisions`).send({ design: EDGE_MODULE, rationale: 'Approved as reviewed.' });
    expect(signed.status).toBe(201);
    const after = await state();
    expect(after.state).toBe('signed_off');
    expect(after.signedDecision.id).toBe(signed.body.id);

    // Asking again after a sign-off opens a new round.
    const newer = await seedUser(api.ctx.db, api.team.team.id, 'reviewer');
    await ask(api.engineer, [newer.id]);
    expect(await state()).toMatchObject({ state: 'in_review', asked: 1 });
  });

  it('only the asked reviewer may answer (403); other teams get 404', async () => {
    const [request] = (await ask(api.engineer, [api.team.reviewer.id])).body;
    const otherReviewer = await authed(api.app, await seedUser(api.ctx.db, api.team.team.id, 'reviewer'));
    expect((await otherReviewer.post(`/api/review-requests/${request.id}/answer`).send({ state: 'accepted' })).status).toBe(403);
    expect((await api.engineer.post(`/api/review-requests/${request.id}/answer`).send({ state: 'accepted' })).status).toBe(403);
    const outsider = await authed(api.app, (await seedTeam(api.ctx.db, 'Other Co')).reviewer);
    expect((await outsider.post(`/api/review-requests/${request.id}/answer`).send({ state: 'accepted' })).status).toBe(404);
  });
});

describe('studyReviewState(requests, lastSignedAt)', () => {
  const at = (s: number) => new Date(Date.UTC(2025, 0, 1, 0, 0, s));
  const req = (reviewerId: string, state: 'asked' | 'accepted' | 'sent_back', s: number) => ({ reviewerId, state, createdAt: at(s), answeredAt: null });

  it('is draft with no requests and signed off with a signature and no later request', () => {
    expect(studyReviewState([], null)).toBe('draft');
    expect(studyReviewState([req('a', 'accepted', 1)], at(5))).toBe('signed_off');
  });

  it('uses each reviewer’s latest request of the round', () => {
    expect(studyReviewState([req('a', 'sent_back', 1), req('a', 'asked', 2)], null)).toBe('in_review');
    expect(studyReviewState([req('a', 'accepted', 1), req('b', 'sent_back', 2)], null)).toBe('sent_back');
    expect(studyReviewState([req('a', 'sent_back', 1), req('b', 'asked', 9)], at(5))).toBe('in_review');
  });
});
