import { z } from 'zod';
import { singleLine } from './text.ts';
import { ROLES, type Role } from '../policies.ts';

/** The signed-in person as the client sees them. */
export interface SessionUserDto {
  id: number;
  login: string;
  name: string | null;
  avatarUrl: string | null;
  role: Role;
}

export interface SessionDto {
  user: SessionUserDto | null;
  csrfToken: string;
}

/** A row of the admin's user list. */
export interface AdminUserDto extends SessionUserDto {
  suspended: boolean;
  suspendedAt: string | null;
  createdAt: string;
  lastSignInAt: string | null;
}

export interface AdminUserListDto {
  items: AdminUserDto[];
  total: number;
  page: number;
  pageSize: number;
}

export const listUsersQuery = z.strictObject({
  q: singleLine(64).optional(),
  role: z.enum(ROLES).optional(),
  page: z.coerce.number().int().min(1).max(100000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});
export type ListUsersQuery = z.infer<typeof listUsersQuery>;

/** Admins grant or revoke moderator; making another admin is also allowed. */
export const setRoleInput = z.strictObject({ role: z.enum(ROLES) });
export type SetRoleInput = z.infer<typeof setRoleInput>;

export const setSuspendedInput = z.strictObject({ suspended: z.boolean() });
export type SetSuspendedInput = z.infer<typeof setSuspendedInput>;

export const userIdParams = z.strictObject({ userId: z.coerce.number().int().positive() });
export const userTokenParams = z.strictObject({ userId: z.coerce.number().int().positive(), tokenId: z.coerce.number().int().positive() });
