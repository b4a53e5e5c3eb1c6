import { randomBytes } from 'node:crypto';
import type { Role } from '../../shared/policies.ts';
import { User } from '../../server/models/user.model.ts';
import { standInGithubId, standInEmail } from '../../server/dev/demo-accounts.ts';

/** A handle no other test uses. */
export const uniqueLogin = (prefix = 'maker') => `${prefix}-${randomBytes(4).toString('hex')}`;

/** A user row that the OAuth stand-in will sign in as (same id scheme). */
export async function createUser(overrides: { login?: string; role?: Role; suspendedAt?: Date | null } = {}) {
  const login = overrides.login ?? uniqueLogin();
  return User.create({
    githubId: standInGithubId(login),
    login,
    name: login,
    email: standInEmail(login),
    avatarUrl: null,
    role: overrides.role ?? 'maker',
    suspendedAt: overrides.suspendedAt ?? null,
  });
}
