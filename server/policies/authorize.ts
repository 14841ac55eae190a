import { can, type Capability } from '../../shared/roles';
import { forbidden } from '../errors';
import type { AuthContext } from '../auth/types';

/** Throws 403 unless the caller's roles in the working team grant the capability. */
export function authorize(auth: AuthContext, capability: Capability) {
  if (!can(auth.membership.roles, capability)) throw forbidden();
}
