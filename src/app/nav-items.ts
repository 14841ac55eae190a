import type { ComponentType, SVGProps } from 'react';
import type { Capability } from '@shared/roles';
import type { FeaturesJson } from '@shared/schemas/session';
import { BatteryIcon, BoardIcon, CalendarIcon, ChecksIcon, MailIcon, ScheduleIcon, TeamIcon, WrenchIcon } from '../components/ui/icons';
import { ShieldIcon } from '../components/ui/safety-icons';

export interface NavItem {
  to: string;
  label: string;
  icon: ComponentType<SVGProps<SVGSVGElement>>;
  /** The read capability of the area; without it the item is not shown at all. */
  capability: Capability;
  /**
   * Used at every match, so kept in a phone's bottom bar; the others are one tap further, on
   * the "More" page (a 360 px bar holds six items at most, and later areas still join).
   */
  primary: boolean;
  /** A part of the server that may be off (the mailbox exists only while the SMTP fake takes the mail). */
  feature?: keyof FeaturesJson;
}

// Only the areas that exist today; DESIGN §3 lists the others, which join as they are built.
export const NAV_ITEMS: NavItem[] = [
  { to: '/', label: 'Board', icon: BoardIcon, capability: 'board:read', primary: true },
  { to: '/schedule', label: 'Schedule', icon: ScheduleIcon, capability: 'board:read', primary: true },
  { to: '/checks', label: 'Checks', icon: ChecksIcon, capability: 'board:read', primary: true },
  { to: '/batteries', label: 'Batteries', icon: BatteryIcon, capability: 'board:read', primary: true },
  { to: '/repairs', label: 'Repairs', icon: WrenchIcon, capability: 'board:read', primary: true },
  { to: '/safety', label: 'Safety', icon: ShieldIcon, capability: 'incidents:report', primary: false },
  { to: '/events', label: 'Events', icon: CalendarIcon, capability: 'events:read', primary: false },
  { to: '/team', label: 'Team', icon: TeamIcon, capability: 'team:read', primary: false },
  { to: '/mailbox', label: 'Mailbox', icon: MailIcon, capability: 'mailbox:read', primary: false, feature: 'mailbox' },
];
