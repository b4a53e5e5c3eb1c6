import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AdminUserDto, SetRoleInput } from '@shared/schemas/user.ts';
import { api } from '@/lib/api-client.ts';
import { adminUserQueries } from './list-users.ts';

/** Grant or revoke a role. */
export function useSetUserRole() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: number } & SetRoleInput) =>
      api.patch<AdminUserDto>(`/api/admin/users/${userId}/role`, { role }),
    onSuccess: () => qc.invalidateQueries({ queryKey: adminUserQueries.all }),
  });
}

/** Suspend or reinstate an account. */
export function useSetUserSuspended() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, suspended }: { userId: number; suspended: boolean }) =>
      api.patch<AdminUserDto>(`/api/admin/users/${userId}/suspension`, { suspended }),
    onSuccess: () => qc.invalidateQueries({ queryKey: adminUserQueries.all }),
  });
}
