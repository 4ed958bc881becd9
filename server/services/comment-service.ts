/**
 * Comments on a study, a design row or a chart. Each keeps the view state the author saw, so the link in a
 * mention e-mail reopens exactly that view. @Name (or @Name without spaces, or @email-local-part) mentions
 * a team member who can read the study; they get an e-mail.
 */
import type { AuthUser } from '../auth/types.ts';
import { fieldError } from '../auth/errors.ts';
import type { AppContext } from '../context.ts';
import { Comment, type CommentTargetKind } from '../entities/comment.ts';
import { StudyShare } from '../entities/study-share.ts';
import type { Study } from '../entities/study.ts';
import { User } from '../entities/user.ts';
import type { CommentCreate } from '../../shared/schemas/review.ts';
import { canRead, findInStudy, findStudyFor } from './study-access.ts';

export interface CommentView {
  id: string;
  studyId: string;
  author: { id: string; name: string };
  body: string;
  target: { kind: CommentTargetKind; ref: string | null };
  viewState: Record<string, unknown> | null;
  mentions: { id: string; name: string }[];
  createdAt: string;
  /** Path in the app that reopens the view the author saw. */
  link: string;
}

export interface MentionCandidate {
  id: string;
  name: string;
  email: string;
}

/** Path that opens the study's review tab (the tab lives in the hash) on this comment; the client restores its view state. */
export const commentPath = (studyId: string, commentId: string) => `/studies/${studyId}?comment=${commentId}#review`;

const escapeRe = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** Ids of the members named in `body` with @Full Name, @FullName or @local-part (case-insensitive). */
export function mentionedIn(body: string, members: readonly MentionCandidate[]): string[] {
  const found = new Set<string>();
  for (const m of members) {
    const handles = [m.name, m.name.replace(/\s+/g, ''), m.email.split('@')[0] ?? ''].filter((h) => h.length > 0);
    // A handle ends at a character that cannot continue a name, so @Ann does not match @Anna.
    const re = new RegExp(`(^|[^\\p{L}\\p{N}_])@(${handles.map(escapeRe).join('|')})(?![\\p{L}\\p{N}_])`, 'iu');
    if (re.test(body)) found.add(m.id);
  }
  return [...found];
}

async function readersAmong(ctx: AppContext, study: Study, ids: string[]): Promise<User[]> {
  if (ids.length === 0) return [];
  const users = await ctx.db.getRepository(User).createQueryBuilder('u').where('u.id IN (:...ids)', { ids }).getMany();
  const shares = await ctx.db.getRepository(StudyShare).findBy({ studyId: study.id });
  const shareOf = (userId: string) => shares.find((s) => s.userId === userId)?.access ?? null;
  return users.filter((u) => canRead(u, study, shareOf(u.id)));
}

function view(c: Comment, names: Map<string, string>): CommentView {
  return {
    id: c.id,
    studyId: c.studyId,
    author: { id: c.authorId, name: names.get(c.authorId) ?? '(former member)' },
    body: c.body,
    target: { kind: c.targetKind, ref: c.targetRef },
    viewState: c.viewState,
    mentions: c.mentions.map((id) => ({ id, name: names.get(id) ?? '(former member)' })),
    createdAt: c.createdAt.toISOString(),
    link: commentPath(c.studyId, c.id),
  };
}

async function namesFor(ctx: AppContext, teamId: string): Promise<Map<string, string>> {
  const users = await ctx.db.getRepository(User).findBy({ teamId });
  return new Map(users.map((u) => [u.id, u.name]));
}

/** The study's comments, oldest first (a thread reads top to bottom). */
export async function listComments(ctx: AppContext, user: AuthUser, studyId: string): Promise<CommentView[]> {
  await findStudyFor(ctx, user, studyId, 'read');
  const rows = await ctx.db.getRepository(Comment).find({ where: { studyId }, order: { createdAt: 'ASC' } });
  const names = await namesFor(ctx, user.teamId);
  return rows.map((c) => view(c, names));
}

export async function getComment(ctx: AppContext, user: AuthUser, id: string): Promise<CommentView> {
  const { row: c } = await findInStudy(ctx, user, 'comment', 'read', () => ctx.db.getRepository(Comment).findOneBy({ id }));
  return view(c, await namesFor(ctx, user.teamId));
}

/**
 * Adds a comment (anyone who can read the study, reviewers included) and mails each mentioned member.
 * @param baseUrl origin for the link in the e-mail (server/auth/links.ts linkBase)
 */
export async function createComment(ctx: AppContext, user: AuthUser, studyId: string, input: CommentCreate, baseUrl: string): Promise<CommentView> {
  const study = await findStudyFor(ctx, user, studyId, 'read');
  const members = await ctx.db.getRepository(User).findBy({ teamId: user.teamId });
  input.mentions.forEach((id, i) => {
    if (!members.some((m) => m.id === id)) throw fieldError(`mentions[${i}]`, 'must be a member of your team');
  });
  const named = mentionedIn(input.body, members);
  const wanted = [...new Set([...input.mentions, ...named])].filter((id) => id !== user.id);
  // Someone who cannot open the study would get a link to a 404; they are not notified or recorded.
  const notified = await readersAmong(ctx, study, wanted);
  const repo = ctx.db.getRepository(Comment);
  const saved = await repo.save(
    repo.create({
      studyId,
      authorId: user.id,
      body: input.body,
      targetKind: input.target.kind,
      targetRef: input.target.ref,
      viewState: input.viewState,
      mentions: notified.map((u) => u.id),
    }),
  );
  await notifyMentions(ctx, user, study, saved, notified, baseUrl);
  return view(saved, new Map(members.map((m) => [m.id, m.name])));
}

const TARGET_WORDS: Record<CommentTargetKind, string> = { study: 'the study', design: 'a design', chart: 'a chart' };

async function notifyMentions(ctx: AppContext, author: AuthUser, study: Study, c: Comment, to: User[], baseUrl: string): Promise<void> {
  if (to.length === 0) return;
  if (!ctx.mailer) {
    ctx.log.warn({ commentId: c.id }, 'mentions not mailed: mail is not configured');
    return;
  }
  const link = `${baseUrl}${commentPath(study.id, c.id)}`;
  const subject = `${author.name} mentioned you on "${study.name}"`;
  for (const u of to) {
    const text =
      `${author.name} mentioned you in a comment on ${TARGET_WORDS[c.targetKind]}${c.targetRef ? ` (${c.targetRef})` : ''} ` +
      `in the study "${study.name}":\n\n${c.body}\n\nOpen the view they were looking at:\n${link}\n`;
    try {
      await ctx.mailer.send({ to: u.email, subject, text, teamId: study.teamId });
    } catch (err) {
      // The comment stands; a relay hiccup must not lose it.
      ctx.log.error({ err, commentId: c.id, to: u.id }, 'mention e-mail failed');
    }
  }
}
