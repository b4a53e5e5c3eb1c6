import type { ReactNode } from 'react';
import { RouteError } from '@/components/ui/route-error.tsx';
import { useSession } from '@/features/session/api/get-session.ts';

/** Nothing of the app renders before the session (who is signed in, the CSRF token) is known. */
export function SessionGate({ children }: { children: ReactNode }) {
  const session = useSession();
  if (session.isPending) return <p className="p-6 text-ink-soft">Loading Scanwright…</p>;
  if (session.isError) return <RouteError error={session.error} />;
  return children;
}
