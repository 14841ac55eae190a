import { matchPath, NavLink, useLocation } from 'react-router';
import { can } from '@shared/roles';
import { MoreIcon } from '../components/ui/icons';
import { useSession } from '../features/session/api/get-session';
import { useViewer } from '../lib/authorization';
import { NAV_ITEMS, type NavItem } from './nav-items';

const linkClass = ({ isActive }: { isActive: boolean }) =>
  `flex min-h-16 flex-col items-center justify-center gap-0.5 border-t-4 px-0.5 text-[0.6875rem] min-[400px]:text-sm lg:min-h-12 lg:flex-row lg:justify-start lg:gap-3 lg:rounded-xl lg:border-t-0 lg:border-l-4 lg:px-4 lg:text-lg ${
    isActive ? 'border-accent bg-accent-soft font-bold text-accent-ink' : 'border-transparent text-ink-muted hover:bg-sunken hover:text-ink'
  }`;

function Item({ to, label, icon: Icon, className = '', alsoActive = false }: Pick<NavItem, 'to' | 'label' | 'icon'> & { className?: string; alsoActive?: boolean }) {
  return (
    <li className={`min-w-0 flex-1 ${className}`}>
      <NavLink to={to} end={to === '/'} className={({ isActive }) => linkClass({ isActive: isActive || alsoActive })}>
        <Icon className="size-7 lg:size-6" />
        {/* Six items share a 360 px phone: smaller words there, so none is cut. */}
        <span className="max-w-full truncate">{label}</span>
      </NavLink>
    </li>
  );
}

/** The areas this member may open (the navigation and the More page list the same ones). */
export function useNavItems(): NavItem[] {
  const { membership } = useViewer();
  const features = useSession().data?.features;
  return NAV_ITEMS.filter((item) => can(membership.roles, item.capability) && (!item.feature || features?.[item.feature] === true));
}

/**
 * One navigation landmark: a bottom tab bar under the thumbs on phones and portrait tablets, a
 * side rail on wide screens. The current area is marked by weight and a bar, not by colour alone.
 * A phone's bar holds the areas used at every match and "More" for the rest; from tablet width
 * there is room for every area, so each stays one tap away.
 */
export function AppNav() {
  const items = useNavItems();
  const { pathname } = useLocation();
  if (items.length === 0) return null;
  const secondary = items.filter((item) => !item.primary);
  // On a phone, Events and Team sit behind More: More stays marked while one of them is open.
  const inSecondary = secondary.some((item) => matchPath({ path: item.to, end: false }, pathname));
  return (
    <nav
      aria-label="Main"
      className="fixed inset-x-0 bottom-0 z-20 border-t border-line bg-surface pb-[env(safe-area-inset-bottom)] lg:sticky lg:top-24 lg:w-60 lg:shrink-0 lg:self-start lg:border-0 lg:bg-transparent lg:py-6 lg:pr-0 lg:pl-4"
    >
      <ul className="flex lg:flex-col lg:gap-2">
        {items.map((item) => (
          <Item key={item.to} {...item} className={item.primary ? '' : 'max-sm:hidden'} />
        ))}
        {secondary.length > 0 && <Item to="/more" label="More" icon={MoreIcon} className="sm:hidden" alsoActive={inSecondary} />}
      </ul>
    </nav>
  );
}
