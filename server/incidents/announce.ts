import { emitToIncidents } from '../realtime/broadcast';

/** Tells the team's safety log readers that an incident was reported or changed: its id only. */
export const announceIncident = (teamId: string, id: string) => emitToIncidents(teamId, 'incidents:changed', { id });
