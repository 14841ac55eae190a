import { z } from 'zod';
import type { Role } from '../roles';
import { clientId, requiredOr, versionField } from './common';
import { emailField, MAX_PASSWORD_LENGTH, rolesField } from './session';

/**
 * Alert rules: which incidents reach whom. `immediate` is every incident the safety contacts
 * must hear of at once (beyond first aid, loss of consciousness, battery acid or chemical); the
 * others by their class.
 */
export const ALERT_RULE_KEYS = ['immediate', 'first_aid_only', 'near_miss'] as const;
export type AlertRuleKey = (typeof ALERT_RULE_KEYS)[number];
export const ALERT_RULE_LABELS: Record<AlertRuleKey, string> = {
  immediate: 'At once: beyond first aid, lost consciousness, battery acid or chemical',
  first_aid_only: 'First aid only',
  near_miss: 'Near misses',
};
/** The rules before a team changes them: its safety captains and mentors hear of anything with an injury. */
export const DEFAULT_ALERT_ROLES: Record<AlertRuleKey, Role[]> = {
  immediate: ['safety', 'admin'],
  first_aid_only: ['safety', 'admin'],
  near_miss: [],
};
export const EXTRA_ADDRESSES_MAX = 10;
/** Viewers (guests, parents) never hear of incidents through a role. */
export const ALERTABLE_ROLES = ['admin', 'lead', 'crew', 'battery', 'safety'] as const satisfies readonly Role[];

export const alertRuleParams = z.object({ key: z.enum(ALERT_RULE_KEYS, { message: `One of: ${ALERT_RULE_KEYS.join(', ')}` }) });

/** `PUT /api/team/alert-rules/:key`: the rule's whole setting, with the version it was based on (0 for the default). */
export const alertRuleSchema = z
  .object({
    version: versionField,
    roles: z
      .array(z.enum(ALERTABLE_ROLES, { message: `One of: ${ALERTABLE_ROLES.join(', ')}` }), { message: 'A list of roles' })
      .transform((roles) => [...new Set(roles)]),
    extraAddresses: z
      .array(emailField, { message: 'A list of e-mail addresses' })
      .max(EXTRA_ADDRESSES_MAX, { message: `At most ${EXTRA_ADDRESSES_MAX} addresses` })
      .transform((addresses) => [...new Set(addresses)]),
  })
  .strict();
export type AlertRuleInput = z.output<typeof alertRuleSchema>;

export interface AlertRuleJson {
  key: AlertRuleKey;
  roles: Role[];
  extraAddresses: string[];
  version: number;
}

export interface AlertRulesJson {
  rules: AlertRuleJson[];
}

export const MAIL_KINDS = ['incident_alert', 'invite', 'password_reset'] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

/** `GET /api/team/mail-failures`: mail that could not be delivered after every retry. */
export interface MailFailureJson {
  id: string;
  kind: MailKind;
  to: string;
  subject: string;
  attempts: number;
  lastError: string;
  failedAt: string;
  incidentId: string | null;
}

export interface MailFailuresJson {
  failures: MailFailureJson[];
}

export const mailFailureParams = z.object({ id: z.uuid(requiredOr('Must be a UUID')) });

/** `GET /api/mailbox` (admin, while the local SMTP fake is in use). */
export interface MailboxMessageJson {
  id: string;
  to: string;
  subject: string;
  receivedAt: string;
  text: string;
}

export interface MailboxJson {
  messages: MailboxMessageJson[];
}

/** `POST /api/team/invites` (admin): a one-time link to join the team by e-mail. */
export const createInviteSchema = z
  .object({
    id: clientId.optional(),
    name: z.string(requiredOr('Give a name')).trim().min(1, { message: 'Give a name' }).max(80),
    email: emailField,
    roles: rolesField,
  })
  .strict();
export type CreateInviteInput = z.output<typeof createInviteSchema>;

export interface InviteJson {
  id: string;
  name: string;
  email: string;
  roles: Role[];
  expiresAt: string;
  createdAt: string;
}

export interface InvitesJson {
  invites: InviteJson[];
}

export const inviteParams = z.object({ id: z.uuid(requiredOr('Must be a UUID')) });

/** `POST /api/session/password-reset`: always the same answer, whether the address has an account or not. */
export const passwordResetRequestSchema = z.object({ email: emailField }).strict();

const tokenField = z
  .string(requiredOr('The link is not complete'))
  .regex(/^[A-Za-z0-9_-]{32,128}$/, { message: 'The link is not complete' });

/** `POST /api/account-links/check`: what a one-time link is for, before the form is filled in. */
export const accountLinkCheckSchema = z.object({ token: tokenField }).strict();

/**
 * `POST /api/account-links/use`: sets a new password (reset, or an invite to a new account), or
 * with an invite to an address that has an account already, proves it with that password.
 */
export const accountLinkUseSchema = z
  .object({
    token: tokenField,
    password: z
      .string(requiredOr('Enter a password'))
      .min(1, { message: 'Enter a password' })
      .max(MAX_PASSWORD_LENGTH, { message: `At most ${MAX_PASSWORD_LENGTH} characters` }),
  })
  .strict();

export interface AccountLinkJson {
  purpose: 'invite' | 'reset';
  email: string;
  /** The inviting team, for an invite. */
  teamName: string | null;
  /** True when the address has an account already: the invite is accepted with its password. */
  hasAccount: boolean;
  expiresAt: string;
}

export const INVITE_VALID_DAYS = 7;
export const RESET_VALID_MINUTES = 60;
