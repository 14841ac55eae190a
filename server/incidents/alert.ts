import type { Transaction } from 'sequelize';
import { composeIncidentAlert } from '../../shared/domain/incident-alert';
import type { AlertRuleKey } from '../../shared/schemas/mail';
import { enqueueMail } from '../mail/outbox';
import { Event, type Incident } from '../models';
import { alertRuleOf } from './alert-rules';
import { recipientsOf } from './recipients';

/** Where a report is read: the link an alert carries (the safety log's page of the incident). */
export const incidentLink = (publicUrl: string, incidentId: string) => `${publicUrl}/safety/incidents/${incidentId}`;

/**
 * Queues the alert of one rule for a saved incident, one message per address the team's rule
 * names (none queued when it names nobody). The text says what, where, when and what care,
 * never who: it may leave the team. Sent after the commit, so a refused change sends nothing.
 */
export async function queueIncidentAlert(
  incident: Incident,
  ruleKey: AlertRuleKey,
  { teamName, publicUrl }: { teamName: string; publicUrl: string },
  transaction: Transaction,
) {
  const to = await recipientsOf(incident.teamId, await alertRuleOf(incident.teamId, ruleKey, transaction), transaction);
  if (to.length === 0) return;
  const event = incident.eventId ? await Event.findByPk(incident.eventId, { transaction }) : null;
  const { subject, text } = composeIncidentAlert({
    teamName,
    kind: incident.kind,
    location: incident.location,
    occurredAt: incident.occurredAt,
    // Outside an event there is no local zone to speak of: UTC, and the alert says so.
    timeZone: event?.timeZone ?? 'UTC',
    treatments: incident.treatments,
    involvedCount: incident.involved.length,
    link: incidentLink(publicUrl, incident.id),
  });
  await enqueueMail(
    transaction,
    to.map((address) => ({ teamId: incident.teamId, kind: 'incident_alert' as const, to: address, subject, text, incidentId: incident.id })),
  );
}
