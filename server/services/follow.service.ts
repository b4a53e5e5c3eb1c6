// Following: a maker follows a published build (its new log entries), a registry part (runs that newly count
// for it) or another maker (their newly published builds). What happens is announced by news.service.ts.
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import type { Actor } from '@shared/policies.ts';
import type { FollowDto, FollowParams, FollowStateDto, FollowTargetType } from '@shared/schemas/follow.ts';
import { Build } from '../models/build.model.ts';
import { Follow } from '../models/follow.model.ts';
import { Part } from '../models/part.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { AppError, ConflictError, NotFoundError } from '../errors.ts';

/** Most follows one maker keeps (each one can send mail). */
export const MAX_FOLLOWS = 500;

/** What can be followed: a published build, an accepted part, an active maker other than oneself. */
async function followable(actor: Actor, { targetType, targetId }: FollowParams): Promise<void> {
  if (targetType === 'build') {
    const build = await Build.findByPk(targetId, { attributes: ['id', 'status'] });
    if (!build || build.status !== 'published') throw new NotFoundError('No such published build.');
  } else if (targetType === 'part') {
    const part = await Part.findByPk(targetId, { attributes: ['id', 'status', 'mergedIntoId'] });
    if (!part || part.status !== 'accepted' || part.mergedIntoId) throw new NotFoundError('No such part in the registry.');
  } else {
    if (targetId === actor.id) throw new AppError(400, 'follow_self', 'You cannot follow yourself.');
    const user = await User.findByPk(targetId, { attributes: ['id', 'suspendedAt'] });
    if (!user || user.suspendedAt) throw new NotFoundError('No such maker.');
  }
}

async function stateOf(actor: Actor | null, targetType: FollowTargetType, targetId: number): Promise<FollowStateDto> {
  const [followers, mine] = await Promise.all([
    Follow.count({ where: { targetType, targetId } }),
    actor ? Follow.count({ where: { targetType, targetId, userId: actor.id } }) : 0,
  ]);
  return { targetType, targetId, following: mine > 0, followers };
}

/** Whether the asker follows it, and how many do (visitors get the count). */
export async function followState(actor: Actor | null, params: FollowParams): Promise<FollowStateDto> {
  return stateOf(actor, params.targetType, params.targetId);
}

export async function follow(actor: Actor | null, params: FollowParams): Promise<FollowStateDto> {
  authorize(actor, 'follow.manage');
  await followable(actor, params);
  if ((await Follow.count({ where: { userId: actor.id } })) >= MAX_FOLLOWS) {
    throw new ConflictError(`You follow ${MAX_FOLLOWS} things already; stop following some first.`, 'too_many_follows');
  }
  try {
    await Follow.create({ userId: actor.id, ...params });
  } catch (err) {
    if (!(err instanceof UniqueConstraintError)) throw err; // following twice is the same as once
  }
  return stateOf(actor, params.targetType, params.targetId);
}

export async function unfollow(actor: Actor | null, params: FollowParams): Promise<void> {
  authorize(actor, 'follow.manage');
  await Follow.destroy({ where: { userId: actor.id, ...params } });
}

/** Everything the maker follows, named as its page names it, newest first. */
export async function listFollows(actor: Actor | null): Promise<FollowDto[]> {
  authorize(actor, 'notification.read', { userId: actor?.id });
  const rows = await Follow.findAll({ where: { userId: actor.id }, order: [['id', 'DESC']], limit: MAX_FOLLOWS });
  const ids = (type: FollowTargetType) => rows.filter((r) => r.targetType === type).map((r) => r.targetId);
  const [builds, parts, users] = await Promise.all([
    Build.findAll({ where: { id: ids('build') }, attributes: ['id', 'title'] }),
    Part.findAll({ where: { id: ids('part') }, attributes: ['id', 'name'] }),
    User.findAll({ where: { id: ids('maker') }, attributes: ['id', 'login'] }),
  ]);
  const label = new Map<string, string>([
    ...builds.map((b) => [`build:${b.id}`, b.title] as const),
    ...parts.map((p) => [`part:${p.id}`, p.name] as const),
    ...users.map((u) => [`maker:${u.id}`, u.login] as const),
  ]);
  const path = (type: FollowTargetType, id: number) => (type === 'build' ? `/builds/${id}` : type === 'part' ? `/parts/${id}` : '/builds');
  return rows
    .filter((r) => label.has(`${r.targetType}:${r.targetId}`))
    .map((r) => ({
      targetType: r.targetType,
      targetId: r.targetId,
      label: label.get(`${r.targetType}:${r.targetId}`)!,
      path: path(r.targetType, r.targetId),
      since: r.createdAt.toISOString(),
    }));
}

/** Who follows any of these targets (one query). */
export async function followersOf(targets: Array<{ type: FollowTargetType; id: number }>, transaction?: Transaction): Promise<number[]> {
  if (!targets.length) return [];
  const rows = await Follow.findAll({
    where: { [Op.or]: targets.map((t) => ({ targetType: t.type, targetId: t.id })) },
    attributes: ['userId'],
    transaction,
  });
  return [...new Set(rows.map((r) => r.userId))];
}
