import type { Actor } from '@shared/policies.ts';
import type { SessionUserDto } from '@shared/schemas/user.ts';

/** The session user as the shared rules see them (used only to hide controls). */
export function toActor(user: SessionUserDto | null): Actor | null {
  return user ? { id: user.id, role: user.role, suspended: false } : null;
}
