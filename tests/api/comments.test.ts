import { beforeEach, describe, expect, it } from 'vitest';
import { mentionedIn } from '../../server/services/comment-service.ts';
import { authed, linkIn, seedTeam, seedUser } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';
import { createStudy } from './review-fixtures.ts';

const api = useApiTest({ mail: true, team: 'Kestrel Bay Arrays', signIn: ['engineer', 'reviewer'] });
let studyId: string;

beforeEach(async () => {
  studyId = await createStudy(api.engineer, 'Harbor Point edge module');
});

const VIEW = { tab: 'trade', sweepId: 'f2d1', sort: [{ key: 'edgeEirpDbm', dir: 'desc' }], filters: { maxChannels: 8 }, selected: 12 };

describe('POST /api/studies/:id/comments', () => {
  it('stores a comment on a design row with its view, and mails the @mentioned member a link that reopens it', async () => {
    const res = await api.engineer
      .post(`/api/studies/${studyId}/comments`)
      .send({ body: `@${api.team.reviewer.name} is row 12 worth the extra channels?`, target: { kind: 'design', ref: 'f2d1:12' }, viewState: VIEW });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ target: { kind: 'design', ref: 'f2d1:12' }, viewState: VIEW, author: { id: api.team.engineer.id } });
    expect(res.body.mentions).toEqual([{ id: api.team.reviewer.id, name: api.team.reviewer.name }]);

    const message = await api.mail.latestTo(api.team.reviewer.email);
    expect(message.subject).toContain(api.team.engineer.name);
    expect(message.textBody).toContain('is row 12 worth the extra channels?');
    const { url } = linkIn(message.textBody, `/studies/${studyId}`);
    expect(new URL(url).hash).toBe('#review');
    const commentId = new URL(url).searchParams.get('comment');
    expect(commentId).toBe(res.body.id);

    // The reader follows the link: the comment carries the exact view the author saw.
    const reopened = await api.reviewer.get(`/api/comments/${commentId}`);
    expect(reopened.status).toBe(200);
    expect(reopened.body.viewState).toEqual(VIEW);
  });

  it('mails mentions picked by id too, but never the author and never someone outside the study', async () => {
    const before = (await api.mail.messages()).length;
    const res = await api.engineer.post(`/api/studies/${studyId}/comments`).send({ body: `Note to self @${api.team.engineer.name}`, mentions: [api.team.engineer.id] });
    expect(res.status).toBe(201);
    expect(res.body.mentions).toEqual([]);
    expect((await api.mail.messages()).length).toBe(before);

    const picked = await api.engineer.post(`/api/studies/${studyId}/comments`).send({ body: 'see the HPBW chart', mentions: [api.team.admin.id], target: { kind: 'chart', ref: 'hpbw-vs-scan' } });
    expect(picked.body.mentions.map((m: { id: string }) => m.id)).toEqual([api.team.admin.id]);
    expect((await api.mail.latestTo(api.team.admin.email)).textBody).toContain('see the HPBW chart');
  });

  it('does not notify a member who cannot open a private study', async () => {
    const privateId = (await api.engineer.post('/api/studies').send({ name: 'Private draft', visibility: 'private' })).body.id;
    const colleague = await seedUser(api.ctx.db, api.team.team.id, 'engineer');
    const res = await api.engineer.post(`/api/studies/${privateId}/comments`).send({ body: 'fyi', mentions: [colleague.id] });
    expect(res.status).toBe(201);
    expect(res.body.mentions).toEqual([]);
    await expect(api.mail.latestTo(colleague.email)).rejects.toThrow(/no mail/);
  });

  it('lets a reviewer comment and lists the thread oldest first', async () => {
    await api.engineer.post(`/api/studies/${studyId}/comments`).send({ body: 'first' });
    await api.reviewer.post(`/api/studies/${studyId}/comments`).send({ body: 'second' });
    const list = await api.engineer.get(`/api/studies/${studyId}/comments`);
    expect(list.status).toBe(200);
    expect(list.body.map((c: { body: string }) => c.body)).toEqual(['first', 'second']);
  });

  it('answers 400 naming the field for bad input', async () => {
    const empty = await api.engineer.post(`/api/studies/${studyId}/comments`).send({ body: '   ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields[0].field).toBe('body');
    const noRef = await api.engineer.post(`/api/studies/${studyId}/comments`).send({ body: 'x', target: { kind: 'chart' } });
    expect(noRef.body.error.fields[0].field).toBe('target.ref');
    const stranger = (await seedTeam(api.ctx.db, 'Other Co')).engineer;
    const foreign = await api.engineer.post(`/api/studies/${studyId}/comments`).send({ body: 'x', mentions: [stranger.id] });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.message).toBe('mentions[0]: must be a member of your team');
  });

  it('answers 404 to another team and 401 when signed out', async () => {
    const outsider = await authed(api.app, (await seedTeam(api.ctx.db, 'Other Co')).engineer);
    expect((await outsider.get(`/api/studies/${studyId}/comments`)).status).toBe(404);
    expect((await outsider.post(`/api/studies/${studyId}/comments`).send({ body: 'x' })).status).toBe(404);
    const c = (await api.engineer.post(`/api/studies/${studyId}/comments`).send({ body: 'x' })).body;
    expect((await outsider.get(`/api/comments/${c.id}`)).status).toBe(404);
  });
});

describe('mentionedIn(body, members)', () => {
  const members = [
    { id: 'ann', name: 'Ann Lee', email: 'ann@kb.test' },
    { id: 'anna', name: 'Anna Berg', email: 'a.berg@kb.test' },
  ];
  it('matches @Full Name, @FullName and @local-part, case-insensitively', () => {
    expect(mentionedIn('thanks @ann lee', members)).toEqual(['ann']);
    expect(mentionedIn('thanks @AnnaBerg!', members)).toEqual(['anna']);
    expect(mentionedIn('cc @a.berg', members)).toEqual(['anna']);
  });
  it('does not match a prefix of a longer name or an e-mail address in the text', () => {
    expect(mentionedIn('@Annabel said so', members)).toEqual([]);
    expect(mentionedIn('write to ann@kb.test', members)).toEqual([]);
  });
});
