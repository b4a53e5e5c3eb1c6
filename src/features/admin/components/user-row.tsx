import type { AdminUserDto } from '@shared/schemas/user.ts';
import { ROLES, type Role } from '@shared/policies.ts';
import { Button } from '@/components/ui/button.tsx';
import { UserBadge } from '@/components/ui/user-badge.tsx';
import { useSetUserRole, useSetUserSuspended } from '../api/update-user.ts';
import { UserTokens } from './user-tokens.tsx';

const day = (iso: string | null) => (iso ? iso.slice(0, 10) : '—');

/** One account: role picker, suspend/reinstate (not on one's own row) and its rig tokens. */
export function UserRow({ user, isSelf }: { user: AdminUserDto; isSelf: boolean }) {
  const setRole = useSetUserRole();
  const setSuspended = useSetUserSuspended();
  const error = setRole.error ?? setSuspended.error;
  return (
    <tr className="border-t border-rule align-middle">
      <td className="py-2 pr-3">
        <div className="flex items-center gap-2">
          <UserBadge login={user.login} name={user.name} />
          <div>
            <div className="font-medium">{user.login}</div>
            <div className="text-xs text-ink-soft">{user.name}</div>
          </div>
        </div>
      </td>
      <td className="py-2 pr-3">
        <label className="sr-only" htmlFor={`role-${user.id}`}>
          Role of {user.login}
        </label>
        <select
          id={`role-${user.id}`}
          className="rounded border border-rule bg-white px-2 py-1 text-sm"
          value={user.role}
          disabled={isSelf || setRole.isPending}
          onChange={(e) => setRole.mutate({ userId: user.id, role: e.target.value as Role })}
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {r}
            </option>
          ))}
        </select>
      </td>
      <td className="num py-2 pr-3 text-sm">{day(user.createdAt)}</td>
      <td className="num py-2 pr-3 text-sm">{day(user.lastSignInAt)}</td>
      <td className="py-2 pr-3 text-sm">{user.suspended ? <span className="font-medium text-danger">Suspended</span> : 'Active'}</td>
      <td className="py-2 text-right">
        {!isSelf && (
          <Button
            variant={user.suspended ? 'secondary' : 'danger'}
            disabled={setSuspended.isPending}
            onClick={() => setSuspended.mutate({ userId: user.id, suspended: !user.suspended })}
            aria-label={`${user.suspended ? 'Reinstate' : 'Suspend'} ${user.login}`}
          >
            {user.suspended ? 'Reinstate' : 'Suspend'}
          </Button>
        )}
        <UserTokens userId={user.id} login={user.login} />
        {error && (
          <p role="alert" className="mt-1 text-xs text-danger">
            {error.message}
          </p>
        )}
      </td>
    </tr>
  );
}
