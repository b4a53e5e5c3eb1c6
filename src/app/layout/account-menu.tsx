import { useLocation } from 'react-router-dom';
import type { SessionDto } from '@shared/schemas/user.ts';
import { Button } from '@/components/ui/button.tsx';
import { UserBadge } from '@/components/ui/user-badge.tsx';
import { paths } from '@/config/paths.ts';
import { useSignOut } from '@/features/session/api/sign-out.ts';

const ROLE_LABEL = { maker: 'Maker', moderator: 'Moderator', admin: 'Admin' } as const;

/** Sign-in link for visitors; who is signed in, their role, and sign-out otherwise. */
export function AccountMenu({ session }: { session: SessionDto | null }) {
  const location = useLocation();
  const signOut = useSignOut();
  if (!session) return null;
  if (!session.user) {
    return (
      <a
        href={paths.signIn(location.pathname + location.search)}
        className="inline-flex rounded-md border border-copper bg-copper px-3 py-1.5 text-sm font-medium text-white hover:bg-copper-dark"
      >
        Sign in
      </a>
    );
  }
  const u = session.user;
  return (
    <div className="flex items-center gap-3">
      <UserBadge login={u.login} name={u.name} />
      <div className="text-sm leading-tight">
        <div className="font-medium" data-testid="signed-in-login">
          {u.login}
        </div>
        <div className="text-xs text-teal-dark" data-testid="signed-in-role">
          {ROLE_LABEL[u.role]}
        </div>
      </div>
      <Button variant="ghost" onClick={() => signOut.mutate()} disabled={signOut.isPending}>
        Sign out
      </Button>
    </div>
  );
}
