/**
 * Who may do what in a team. The one role → capability table, read by the server (enforcement,
 * deny by default) and by the client (hide what a member cannot do).
 */

export const ROLES = ['admin', 'lead', 'crew', 'battery', 'safety', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Mentor (admin)',
  lead: 'Pit lead',
  crew: 'Pit crew',
  battery: 'Battery handler',
  safety: 'Safety captain',
  viewer: 'Viewer',
};

/** Capabilities are `area:verb`; an area's routes check exactly one each. */
export const CAPABILITIES = {
  'board:read': ['admin', 'lead', 'crew', 'battery', 'safety', 'viewer'],
  'team:read': ['admin', 'lead', 'crew', 'battery', 'safety', 'viewer'],
  'members:read': ['admin', 'lead', 'crew', 'battery', 'safety', 'viewer'],
  'members:manage': ['admin'],
  'events:read': ['admin', 'lead', 'crew', 'battery', 'safety', 'viewer'],
  'events:manage': ['admin'],
  'settings:manage': ['admin'],
  'schedule:edit': ['admin', 'lead'],
  'field:progress': ['admin', 'lead'],
  'templates:edit': ['admin', 'lead'],
  'checks:mark': ['admin', 'lead', 'crew'],
  'checks:sign-off': ['admin', 'lead'],
  // A viewer reads tickets' titles and status only (through board:read).
  'repairs:read': ['admin', 'lead', 'crew', 'battery', 'safety'],
  'repairs:work': ['admin', 'lead', 'crew'],
  // Placing a card by hand, removing anyone's photo, editing the subsystem list.
  'repairs:manage': ['admin', 'lead'],
  'batteries:swap': ['admin', 'crew', 'battery'],
  'batteries:manage': ['admin', 'battery'],
  'incidents:report': ['admin', 'lead', 'crew', 'battery', 'safety', 'viewer'],
  'incidents:read': ['admin', 'safety'],
  // Editing a report: follow-ups, closing, photos of any report.
  'incidents:manage': ['admin', 'safety'],
  // Alert rules, and the alerts that could not be delivered.
  'alerts:manage': ['admin', 'safety'],
  'mailbox:read': ['admin'],
  'screens:manage': ['admin'],
} as const satisfies Record<string, readonly Role[]>;

export type Capability = keyof typeof CAPABILITIES;

/** True when any of the roles grants the capability; unknown capabilities are denied. */
export function can(roles: readonly Role[], capability: Capability): boolean {
  // Own keys only: 'toString' or '__proto__' must deny, not reach Object.prototype.
  const allowed: readonly Role[] | undefined = Object.hasOwn(CAPABILITIES, capability) ? CAPABILITIES[capability] : undefined;
  if (!allowed) return false;
  return roles.some((role) => allowed.includes(role));
}
