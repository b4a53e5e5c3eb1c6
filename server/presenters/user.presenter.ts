import type { AdminUserDto, SessionUserDto } from '@shared/schemas/user.ts';
import type { User } from '../models/user.model.ts';

/** What any page may know about the signed-in user. */
export function presentSessionUser(u: User): SessionUserDto {
  return { id: u.id, login: u.login, name: u.name, avatarUrl: u.avatarUrl, role: u.role };
}

/** What the admin page shows (no e-mail addresses). */
export function presentAdminUser(u: User): AdminUserDto {
  return {
    ...presentSessionUser(u),
    suspended: u.suspendedAt != null,
    suspendedAt: u.suspendedAt?.toISOString() ?? null,
    createdAt: u.createdAt.toISOString(),
    lastSignInAt: u.lastSignInAt?.toISOString() ?? null,
  };
}
