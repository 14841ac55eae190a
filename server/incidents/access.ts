import { can } from '../../shared/roles';
import type { AuthContext } from '../auth/types';
import { forbidden } from '../errors';
import type { Incident } from '../models';
import type { IncidentView } from '../presenters/incident';

/**
 * How the caller may see one of the team's incidents: whole for those who read the safety log,
 * the reporter's own view for whoever sent it, and not at all (403) for anyone else in the team.
 */
export function viewOf(auth: AuthContext, incident: Incident): IncidentView {
  if (can(auth.membership.roles, 'incidents:read')) return 'full';
  if (incident.reporterId === auth.user.id) return 'reporter';
  throw forbidden();
}
