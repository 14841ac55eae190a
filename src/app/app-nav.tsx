import { NavLink } from 'react-router';
import { can } from '@shared/roles';
import { useViewer } from '../lib/authorization';
import { NAV_ITEMS } from './nav-items';

/**
 * One navigation landmark: a bottom tab bar under the thumbs on phones and portrait tablets, a
 * side rail on wide screens. The current area is marked by weight and a bar, not by colour alone.
 */
export function AppNav() {
  const { membership } = useViewer();
  const items = NAV_ITEMS.filter((item) => can(membership.roles, item.capability));
  if (items.length === 0) return null;
  return (
    <nav
      aria-label="Main"
      className="fixed inset-x-0 bottom-0 z-20 border-t border-line bg-surface pb-[env(safe-area-inset-bottom)] lg:sticky lg:top-24 lg:w-60 lg:shrink-0 lg:self-start lg:border-0 lg:bg-transparent lg:py-6 lg:pr-0 lg:pl-4"
    >
      <ul className="flex lg:flex-col lg:gap-2">
        {items.map(({ to, label, icon: Icon }) => (
          <li key={to} className="min-w-0 flex-1">
            <NavLink
              to={to}
              end={to === '/'}
              className={({ isActive }) =>
                `flex min-h-16 flex-col items-center justify-center gap-0.5 border-t-4 px-0.5 text-[0.6875rem] min-[400px]:text-sm lg:min-h-12 lg:flex-row lg:justify-start lg:gap-3 lg:rounded-xl lg:border-t-0 lg:border-l-4 lg:px-4 lg:text-lg ${
                  isActive
                    ? 'border-accent bg-accent-soft font-bold text-accent-ink'
                    : 'border-transparent text-ink-muted hover:bg-sunken hover:text-ink'
                }`
              }
            >
              <Icon className="size-7 lg:size-6" />
              {/* Six areas share a 360 px phone: smaller words there, so none is cut. */}
              <span className="max-w-full truncate">{label}</span>
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
