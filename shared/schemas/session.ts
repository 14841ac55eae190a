import { z } from 'zod';
import './messages';
import { ROLES, type Role } from '../roles';

export const MIN_PASSWORD_LENGTH = 10;
export const MAX_PASSWORD_LENGTH = 200;

export const emailField = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: 'Enter a valid e-mail address' }).max(254));

// bcrypt reads only the first 72 bytes: a longer password would be a shorter one in disguise.
export const MAX_NEW_PASSWORD_BYTES = 72;

export const passwordField = z
  .string()
  .min(MIN_PASSWORD_LENGTH, { message: `At least ${MIN_PASSWORD_LENGTH} characters` })
  .refine((password) => new TextEncoder().encode(password).length <= MAX_NEW_PASSWORD_BYTES, {
    message: `At most ${MAX_NEW_PASSWORD_BYTES} bytes (about ${MAX_NEW_PASSWORD_BYTES} letters)`,
  });

export const signInSchema = z.object({
  email: emailField,
  password: z.string().min(1, { message: 'Enter your password' }).max(MAX_PASSWORD_LENGTH),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const switchTeamSchema = z.object({ teamId: z.uuid({ message: 'Must be a UUID' }) });

export const changePasswordSchema = z.object({
  currentPassword: z.string().min(1, { message: 'Enter your current password' }).max(MAX_PASSWORD_LENGTH),
  newPassword: passwordField,
});
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

export const roleField = z.enum(ROLES, { message: `One of ${ROLES.join(', ')}` });
export const rolesField = z
  .array(roleField)
  .min(1, { message: 'Give at least one role' })
  .transform((roles) => [...new Set(roles)]);

export interface UserJson {
  id: string;
  name: string;
  email: string;
}

export interface MembershipJson {
  id: string;
  teamId: string;
  teamName: string;
  teamNumber: number;
  roles: Role[];
  /** The team whose data this session reads and writes. */
  active: boolean;
}

/** What this server offers, whoever asks: the client shows a page only when both it and the role allow. */
export interface FeaturesJson {
  /** Mail goes to the local SMTP fake, whose messages the Mailbox page shows. */
  mailbox: boolean;
}

export interface SessionJson {
  user: UserJson;
  memberships: MembershipJson[];
  csrfToken: string;
  features: FeaturesJson;
}
