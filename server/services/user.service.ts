import { Op } from 'sequelize';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { Actor } from '@shared/policies.ts';
import type { AdminUserListDto, ListUsersQuery, SetRoleInput, SetSuspendedInput, AdminUserDto } from '@shared/schemas/user.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { ForbiddenError, NotFoundError } from '../errors.ts';
import { presentAdminUser } from '../presenters/user.presenter.ts';
import { recordAudit } from './audit.service.ts';
import { nameUser } from './audit-names.ts';

export interface GithubIdentity {
  githubId: string;
  login: string;
  name: string | null;
  email: string | null;
  avatarUrl: string | null;
}

/** The policy module's view of a user row. */
export function toActor(u: User): Actor {
  return { id: u.id, role: u.role, suspended: u.suspendedAt != null };
}

/**
 * Find or create the account behind a GitHub identity at sign-in; ADMIN_LOGINS become admins.
 * Suspended accounts are refused here, so a suspended person cannot sign back in.
 */
export async function signInFromGithub(identity: GithubIdentity, adminLogins: string[]): Promise<{ user: User; created: boolean }> {
  const login = identity.login.toLowerCase();
  let user = await User.findOne({ where: { githubId: identity.githubId } });
  const created = !user;
  if (user?.suspendedAt) throw new ForbiddenError('This account is suspended.', 'account_suspended');
  const fields = { login, name: identity.name, avatarUrl: identity.avatarUrl, lastSignInAt: new Date() };
  if (!user) {
    user = await User.create({ githubId: identity.githubId, email: identity.email, ...fields });
  } else {
    await user.update({ ...fields, email: identity.email ?? user.email });
  }
  if (adminLogins.includes(login) && user.role !== 'admin') await user.update({ role: 'admin' });
  return { user, created };
}

/** Load the session's user; null when gone or suspended, which signs them out. */
export async function findActiveUser(id: number): Promise<User | null> {
  const user = await User.findByPk(id);
  return user && !user.suspendedAt ? user : null;
}

/** The admin's user list, searchable by login or name. */
export async function listUsers(actor: Actor | null, query: ListUsersQuery): Promise<AdminUserListDto> {
  authorize(actor, 'user.list');
  const where: Record<string | symbol, unknown> = {};
  if (query.role) where.role = query.role;
  if (query.q) where[Op.or] = [{ login: { [Op.like]: `%${query.q}%` } }, { name: { [Op.like]: `%${query.q}%` } }];
  const { rows, count } = await User.findAndCountAll({
    where,
    order: [['login', 'ASC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { items: rows.map(presentAdminUser), total: count, page: query.page, pageSize: query.pageSize };
}

async function loadUser(userId: number): Promise<User> {
  const user = await User.findByPk(userId);
  if (!user) throw new NotFoundError('No such user.');
  return user;
}

/** Grant or revoke a role (admins only, never on themselves); the change is on the audit trail, naming the account. */
export async function setUserRole(actor: Actor | null, userId: number, input: SetRoleInput): Promise<AdminUserDto> {
  const user = await loadUser(userId);
  authorize(actor, 'user.set-role', { userId: user.id });
  const before = user.role;
  await withWriteTransaction(user.sequelize, async (transaction) => {
    await user.update({ role: input.role }, { transaction });
    await recordAudit(
      actor,
      {
        action: 'user.set-role',
        targetType: 'user',
        targetId: user.id,
        targetLabel: nameUser(user),
        note: `Role: ${before} → ${input.role}`,
      },
      transaction,
    );
  });
  return presentAdminUser(user);
}

/** Suspend or reinstate an account; suspension ends its sessions at once. */
export async function setUserSuspended(actor: Actor | null, userId: number, input: SetSuspendedInput): Promise<AdminUserDto> {
  const user = await loadUser(userId);
  authorize(actor, 'user.suspend', { userId: user.id });
  await withWriteTransaction(user.sequelize, async (transaction) => {
    await user.update({ suspendedAt: input.suspended ? new Date() : null }, { transaction });
    if (input.suspended) await user.sequelize.models.Session.destroy({ where: { userId: user.id }, transaction });
    await recordAudit(
      actor,
      { action: input.suspended ? 'user.suspend' : 'user.reinstate', targetType: 'user', targetId: user.id, targetLabel: nameUser(user) },
      transaction,
    );
  });
  return presentAdminUser(user);
}
