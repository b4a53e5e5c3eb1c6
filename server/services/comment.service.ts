// Comments on published builds: any signed-in maker writes one (Markdown, shown with the site's safe
// renderer), the build's owner is notified (and mailed unless they turned comment mail off), moderators hide one with a note (kept on the audit trail);
// hidden comments are gone from the list for everyone.
import type { Actor } from '@shared/policies.ts';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { BuildCommentDto, CreateCommentInput, HideCommentInput } from '@shared/schemas/comment.ts';
import { Build } from '../models/build.model.ts';
import { BuildComment } from '../models/build-comment.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { ConflictError, NotFoundError } from '../errors.ts';
import { presentComment } from '../presenters/comment.presenter.ts';
import { loadBuildForView } from './build-access.ts';
import { kickOutbox } from './outbox.service.ts';
import { tell } from './news.service.ts';
import { recordAudit } from './audit.service.ts';

/** Most comments a build page lists (the newest are kept; older ones stay in the database). */
const MAX_LISTED = 500;

/** A published build, or 404 for what the actor cannot see and 409 for a build that is not published. */
async function publishedBuild(actor: Actor | null, buildId: number): Promise<Build> {
  const build = await loadBuildForView(actor, buildId);
  if (build.status !== 'published') throw new ConflictError('Only published builds take comments.', 'build_not_published');
  return build;
}

/** A comment anyone who can see its build sees (not hidden, on a published build); 404 otherwise. */
export async function visibleComment(actor: Actor | null, commentId: number): Promise<BuildComment> {
  const c = await BuildComment.findByPk(commentId, { attributes: ['id', 'buildId', 'authorId', 'hiddenAt'] });
  if (!c || c.hiddenAt) throw new NotFoundError('No such comment.');
  await publishedBuild(actor, c.buildId);
  return c;
}

export async function listComments(actor: Actor | null, buildId: number): Promise<BuildCommentDto[]> {
  const build = await publishedBuild(actor, buildId);
  const rows = await BuildComment.findAll({
    where: { buildId, hiddenAt: null },
    attributes: ['id', 'buildId', 'authorId', 'body', 'createdAt'],
    order: [['id', 'DESC']],
    limit: MAX_LISTED,
  });
  rows.reverse();
  const users = await User.findAll({ where: { id: [...new Set(rows.map((r) => r.authorId))] }, attributes: ['id', 'login'] });
  const authors = new Map(users.map((u) => [u.id, u.login]));
  return rows.map((c) => presentComment(c, authors, actor, build.ownerId));
}

export async function createComment(actor: Actor | null, buildId: number, input: CreateCommentInput): Promise<BuildCommentDto> {
  authorize(actor, 'content.create');
  const build = await publishedBuild(actor, buildId);
  const login = (await User.findByPk(actor.id, { attributes: ['login'] }))?.login ?? 'A maker';
  const comment = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const c = await BuildComment.create({ buildId, authorId: actor.id, body: input.body }, { transaction });
    const excerpt = input.body.length > 600 ? `${input.body.slice(0, 600)}…` : input.body;
    await tell(
      [build.ownerId],
      {
        kind: 'comment',
        text: `${login} commented on your build “${build.title}”`,
        more: [excerpt],
        path: `/builds/${build.id}#comment-${c.id}`,
        subject: `${login} commented on ${build.title}`,
        linkText: 'Read and answer',
      },
      { except: actor.id, mailKind: 'comments', transaction },
    );
    return c;
  });
  kickOutbox();
  return presentComment(comment, new Map([[actor.id, login]]), actor, build.ownerId);
}

/** A moderator hides a comment with a note; it leaves the list for everyone and the note goes on the audit trail. */
export async function hideComment(actor: Actor | null, commentId: number, input: HideCommentInput): Promise<void> {
  authorize(actor, 'review.access');
  await withWriteTransaction(BuildComment.sequelize!, async (transaction) => {
    const c = await BuildComment.findByPk(commentId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!c || c.hiddenAt) throw new NotFoundError('No such comment.');
    const build = await Build.findByPk(c.buildId, { attributes: ['id', 'title', 'ownerId'], transaction });
    authorize(actor, 'comment.hide', { authorIds: [c.authorId, build?.ownerId ?? 0] });
    await c.update({ hiddenAt: new Date(), hiddenNote: input.note, hiddenById: actor.id }, { transaction });
    const author = await User.findByPk(c.authorId, { attributes: ['login'], transaction });
    await recordAudit(
      actor,
      {
        action: 'comment.hide',
        targetType: 'comment',
        targetId: c.id,
        targetLabel: `comment by ${author?.login ?? 'a former maker'} on “${build?.title ?? 'a deleted build'}”`,
        note: input.note,
      },
      transaction,
    );
  });
}
