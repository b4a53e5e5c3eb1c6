// The review thread of a build: its maker and the moderators talk about the review (a return note answered,
// a question before publishing). The thread shows the desk's decisions in between, in the order they happened.
// Each post is told to the other side: a maker's post to the moderators who took part (posted or decided),
// or to every moderator while nobody has; a moderator's post to the maker.
import { Op } from 'sequelize';
import { withWriteTransaction } from '../db/write-transaction.ts';
import { can, type Actor } from '@shared/policies.ts';
import type { CreateReviewPostInput, ReviewThreadDto, ReviewThreadItemDto } from '@shared/schemas/review-thread.ts';
import { AuditEntry } from '../models/audit-entry.model.ts';
import { Build } from '../models/build.model.ts';
import { ReviewPost } from '../models/review-post.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { NotFoundError } from '../errors.ts';
import { kickOutbox } from './outbox.service.ts';
import { tell } from './news.service.ts';

/** Most posts one thread lists (the newest are kept). */
const MAX_LISTED = 300;
const DECISION_WORDS: Record<string, string> = {
  'build.publish': 'Published',
  'build.return': 'Returned with notes',
  'build.decline': 'Declined',
};

/** The build, or 404 for anyone who may not read its thread (its existence is not revealed). */
async function threadBuild(actor: Actor | null, buildId: number): Promise<Build> {
  const build = await Build.findByPk(buildId, { attributes: ['id', 'ownerId', 'title', 'status'] });
  if (!build || !can(actor, 'review-thread.view', { ownerId: build.ownerId })) throw new NotFoundError('No such build.');
  return build;
}

export async function getReviewThread(actor: Actor | null, buildId: number): Promise<ReviewThreadDto> {
  const build = await threadBuild(actor, buildId);
  const [posts, decisions] = await Promise.all([
    ReviewPost.findAll({ where: { buildId }, order: [['id', 'DESC']], limit: MAX_LISTED }),
    AuditEntry.findAll({
      where: { targetType: 'build', targetId: buildId, action: { [Op.in]: Object.keys(DECISION_WORDS) } },
      order: [['id', 'ASC']],
    }),
  ]);
  const people = await User.findAll({
    where: { id: [...new Set([...posts.map((p) => p.authorId), ...decisions.map((d) => d.actorId)])] },
    attributes: ['id', 'login', 'role'],
  });
  const login = new Map(people.map((u) => [u.id, u.login]));
  // The maker sees that "a moderator" decided; moderators see who, as on the audit trail.
  const seesNames = can(actor, 'review.access');
  const items: Array<ReviewThreadItemDto & { at: number }> = [
    ...posts.reverse().map((p) => ({
      type: 'post' as const,
      id: p.id,
      author: { id: p.authorId, login: login.get(p.authorId) ?? 'a former member' },
      side: p.authorId === build.ownerId ? ('maker' as const) : ('moderator' as const),
      body: p.body,
      createdAt: p.createdAt.toISOString(),
      at: p.createdAt.getTime(),
    })),
    ...decisions.map((d) => ({
      type: 'decision' as const,
      id: d.id,
      action: d.action,
      label: DECISION_WORDS[d.action] ?? d.action,
      note: d.note,
      by: seesNames ? (login.get(d.actorId) ?? null) : null,
      createdAt: d.createdAt.toISOString(),
      at: d.createdAt.getTime(),
    })),
  ];
  // Times are kept to the second: within one second a decision comes first (a post answers it, not the other way).
  const second = (ms: number) => Math.floor(ms / 1000);
  items.sort((a, b) => second(a.at) - second(b.at) || (a.type === b.type ? a.id - b.id : a.type === 'decision' ? -1 : 1));
  return {
    buildId,
    items: items.map(({ at: _at, ...item }) => item),
    abilities: { post: can(actor, 'review-thread.post', { ownerId: build.ownerId }) },
  };
}

/** The moderators who took part in this build's review; every active moderator while none has. */
async function moderatorsOf(build: Build): Promise<number[]> {
  const [posters, deciders] = await Promise.all([
    ReviewPost.findAll({ where: { buildId: build.id, authorId: { [Op.ne]: build.ownerId } }, attributes: ['authorId'] }),
    AuditEntry.findAll({ where: { targetType: 'build', targetId: build.id }, attributes: ['actorId'] }),
  ]);
  const involved = [...new Set([...posters.map((p) => p.authorId), ...deciders.map((d) => d.actorId)])];
  const active = await User.findAll({
    where: { role: ['moderator', 'admin'], suspendedAt: null, ...(involved.length ? { id: involved } : {}) },
    attributes: ['id'],
  });
  return active.map((u) => u.id).filter((id) => id !== build.ownerId);
}

export async function postToReviewThread(actor: Actor | null, buildId: number, input: CreateReviewPostInput): Promise<ReviewThreadItemDto> {
  const build = await threadBuild(actor, buildId);
  authorize(actor, 'review-thread.post', { ownerId: build.ownerId });
  const fromMaker = actor.id === build.ownerId;
  const recipients = fromMaker ? await moderatorsOf(build) : [build.ownerId];
  const author = await User.findByPk(actor.id, { attributes: ['id', 'login'] });
  const login = author?.login ?? 'someone';
  const post = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const p = await ReviewPost.create({ buildId, authorId: actor.id, body: input.body }, { transaction });
    const excerpt = input.body.length > 600 ? `${input.body.slice(0, 600)}…` : input.body;
    await tell(
      recipients,
      {
        kind: 'review-thread',
        text: fromMaker
          ? `${login} wrote in the review thread of “${build.title}”`
          : `A moderator (${login}) wrote in the review thread of your build “${build.title}”`,
        more: [excerpt],
        path: `/builds/${build.id}#review-thread`,
        subject: `Review thread: ${build.title}`,
        linkText: 'Read and answer',
      },
      { except: actor.id, mailKind: 'review', essential: true, transaction },
    );
    return p;
  });
  kickOutbox();
  return {
    type: 'post',
    id: post.id,
    author: { id: actor.id, login },
    side: fromMaker ? 'maker' : 'moderator',
    body: post.body,
    createdAt: post.createdAt.toISOString(),
  };
}
