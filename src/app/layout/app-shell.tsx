import { useState } from 'react';
import { Link, NavLink, Outlet, useLocation, useSearchParams } from 'react-router-dom';
import { can } from '@shared/policies.ts';
import { DATA_LICENCE } from '@shared/data-licence.ts';
import { LogoMark } from '@/components/ui/logo-mark.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { toActor } from '@/features/session/to-actor.ts';
import { AccountMenu } from './account-menu.tsx';
import { PersonalLinks } from './personal-links.tsx';
import { RouteProgress } from './route-progress.tsx';
import { RouteErrorBoundary } from '@/components/ui/route-error.tsx';

const linkClass = ({ isActive }: { isActive: boolean }) =>
  `block rounded px-3 py-2 text-sm font-medium md:py-1.5 ${isActive ? 'bg-ink text-paper' : 'text-ink hover:bg-paper-deep'}`;

/** The main navigation's links, the same in the header and in the phone menu. */
function NavList({ items, className }: { items: Array<{ to: string; label: string }>; className: string }) {
  return (
    <ul className={className}>
      {items.map((n) => (
        <li key={n.to}>
          <NavLink to={n.to} className={linkClass}>
            {n.label}
          </NavLink>
        </li>
      ))}
    </ul>
  );
}

/** Header with mark, navigation by role, account controls; the page below. */
export function AppShell() {
  const { data: session } = useSession();
  const [open, setOpen] = useState(false);
  const location = useLocation();
  const [params] = useSearchParams();
  const actor = toActor(session?.user ?? null);
  const nav = [
    { to: paths.builds, label: 'Builds' },
    { to: paths.parts, label: 'Parts registry' },
    { to: paths.exchange, label: 'Exchange' },
    { to: paths.workbench, label: 'Workbench' },
    ...(can(actor, 'review.access') ? [{ to: paths.review, label: 'Review desk' }] : []),
    ...(can(actor, 'user.list') ? [{ to: paths.admin, label: 'Admin' }] : []),
  ];
  const signInProblem = location.pathname === '/' ? params.get('signin') : null;

  return (
    <div className="flex min-h-screen flex-col">
      <RouteProgress />
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-white focus:p-2">
        Skip to content
      </a>
      <header className="border-b border-rule bg-paper/95">
        <div className="mx-auto flex max-w-6xl items-center gap-4 px-4 py-3">
          <Link to={paths.home} className="flex items-center gap-2" aria-label="Scanwright, start page">
            <LogoMark />
            <span className="text-lg font-semibold tracking-tight">Scanwright</span>
          </Link>
          <nav aria-label="Main" className="hidden flex-1 md:block">
            <NavList items={nav} className="flex gap-1" />
          </nav>
          <div className="ml-auto hidden md:block">
            <AccountMenu session={session ?? null} />
          </div>
          <button
            type="button"
            className="ml-auto rounded border border-rule px-2 py-1 text-sm md:hidden"
            aria-expanded={open}
            aria-controls="mobile-nav"
            onClick={() => setOpen((o) => !o)}
          >
            {open ? 'Close' : 'Menu'}
          </button>
        </div>
        {open && (
          <nav id="mobile-nav" aria-label="Main" className="border-t border-rule px-4 py-2 md:hidden" onClick={() => setOpen(false)}>
            <NavList items={nav} className="space-y-1" />
            <div className="mt-3 border-t border-rule pt-3">
              <AccountMenu session={session ?? null} />
            </div>
          </nav>
        )}
      </header>
      {session?.user && <PersonalLinks />}
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6">
        {signInProblem && (
          <div className="mb-4">
            <Notice tone="danger" title="Sign-in did not complete">
              {signInProblem === 'suspended'
                ? 'This account is suspended. Contact an admin if you think this is a mistake.'
                : 'Please try again.'}
            </Notice>
          </div>
        )}
        <RouteErrorBoundary key={location.pathname}>
          <Outlet />
        </RouteErrorBoundary>
      </main>
      <footer className="border-t border-rule py-4 text-center text-xs text-ink-soft">
        <p>
          Scanwright · measurements by makers, checked by moderators · high-voltage work: follow local electrical codes and qualified
          practice
        </p>
        <p className="mt-1">
          <Link to={paths.apiReference} className="underline hover:text-copper-dark">
            API and rig tokens
          </Link>{' '}
          ·{' '}
          <a href="/api/registry/dataset/README.md" className="underline hover:text-copper-dark">
            Registry dataset ({DATA_LICENCE.id.replace(/-/g, ' ')})
          </a>
        </p>
      </footer>
    </div>
  );
}
