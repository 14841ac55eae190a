import type { ComponentType, SVGProps } from 'react';
import type { Capability } from '@shared/roles';
import { BatteryIcon, BoardIcon, CalendarIcon, ChecksIcon, ScheduleIcon, TeamIcon } from '../components/ui/icons';

export interface NavItem {
  to: string;
  label: string;
  icon: ComponentType<SVGProps<SVGSVGElement>>;
  /** The read capability of the area; without it the item is not shown at all. */
  capability: Capability;
}

// Only the areas that exist today; DESIGN §3 lists the others, which join as they are built.
export const NAV_ITEMS: NavItem[] = [
  { to: '/', label: 'Board', icon: BoardIcon, capability: 'board:read' },
  { to: '/schedule', label: 'Schedule', icon: ScheduleIcon, capability: 'board:read' },
  { to: '/checks', label: 'Checks', icon: ChecksIcon, capability: 'board:read' },
  { to: '/batteries', label: 'Batteries', icon: BatteryIcon, capability: 'board:read' },
  { to: '/events', label: 'Events', icon: CalendarIcon, capability: 'events:read' },
  { to: '/team', label: 'Team', icon: TeamIcon, capability: 'team:read' },
];
