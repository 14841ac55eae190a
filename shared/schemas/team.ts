import { z } from 'zod';
import type { Role } from '../roles';
import { clientId, versionField } from './common';
import { emailField, rolesField } from './session';

const memberName = z.string().trim().min(1, { message: 'Give a name' }).max(80);

export const createMemberSchema = z.object({
  id: clientId.optional(),
  name: memberName,
  email: emailField,
  roles: rolesField,
});
export type CreateMemberInput = z.infer<typeof createMemberSchema>;

export const updateMemberSchema = z
  .object({
    name: memberName.optional(),
    roles: rolesField.optional(),
    active: z.boolean({ message: 'true or false' }).optional(),
    /** Replaces the member's password with a new temporary one, answered once. */
    resetPassword: z.literal(true, { message: 'Only true' }).optional(),
    version: versionField.optional(),
  })
  .strict();
export type UpdateMemberInput = z.infer<typeof updateMemberSchema>;

export interface TeamJson {
  id: string;
  name: string;
  number: number;
  currentEventId: string | null;
}

/** A member as the team sees them; `id` is the membership id. */
export interface MemberJson {
  id: string;
  userId: string;
  name: string;
  /** Only for those who manage members: viewers include guests, members include minors. */
  email?: string;
  roles: Role[];
  active: boolean;
  version: number;
  createdAt: string;
}

/** Answer to adding a member or resetting a password: the temporary password is shown this once and never stored in clear. */
export interface CreatedMemberJson extends MemberJson {
  temporaryPassword: string | null;
}
