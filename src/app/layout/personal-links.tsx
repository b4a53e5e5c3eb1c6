import { NavLink } from 'react-router-dom';
import { paths } from '@/config/paths.ts';

const links = [
  { to: paths.myBuilds, label: 'My builds' },
  { to: paths.myListings, label: 'My listings' },
  { to: paths.inbox, label: 'Inbox' },
  { to: paths.account, label: 'Mail settings' },
];

/** A thin bar of the signed-in maker's own places, under the main navigation. */
export function PersonalLinks() {
  return (
    <nav aria-label="Your pages" className="border-b border-rule bg-paper-deep/60">
      <ul className="mx-auto flex max-w-6xl flex-wrap gap-x-4 gap-y-1 px-4 py-1.5 text-xs">
        {links.map((l) => (
          <li key={l.to}>
            <NavLink
              to={l.to}
              end
              className={({ isActive }) => (isActive ? 'font-semibold text-copper-dark' : 'text-ink-soft hover:text-copper')}
            >
              {l.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
