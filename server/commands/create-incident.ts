import { alertRuleFor } from '../../shared/domain/incident-alert';
import { classifyIncident } from '../../shared/domain/incident-classification';
import type { CreateIncidentInput } from '../../shared/schemas/incidents';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { queueIncidentAlert } from '../incidents/alert';
import { announceIncident } from '../incidents/announce';
import { assertOurBattery, eventOfReport, inListOrder } from '../incidents/references';
import { Incident, Team } from '../models';
import { assertInstant } from './input-guards';

/**
 * Records a report by anyone in the team, classes it by the care given, and queues the alert
 * its rule asks for (sent after the commit; the report never waits for mail). Resending the
 * same `id` answers the report the first call made, to the one who made it; any other use of
 * an existing id answers 409 `id_taken`.
 */
export async function createIncident(teamId: string, userId: string, { id, eventId, batteryId, ...input }: CreateIncidentInput, { publicUrl }: { publicUrl: string }) {
  assertInstant('occurredAt', new Date(input.occurredAt));
  return inTransaction(async (transaction) => {
    // Two resends of one report queue here, so the second finds the first.
    const team = await Team.lockRow(teamId, transaction);
    if (id) {
      const existing = await Incident.findByPk(id, { transaction });
      if (existing?.teamId === teamId && existing.reporterId === userId) return { incident: existing, created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    if (batteryId) await assertOurBattery(teamId, batteryId, transaction);
    const treatments = inListOrder(input.treatments);
    const ruleKey = alertRuleFor({ kind: input.kind, treatments });
    const incident = await Incident.create(
      {
        ...input,
        ...(id ? { id } : {}),
        teamId,
        eventId: await eventOfReport(team, eventId, transaction),
        occurredAt: new Date(input.occurredAt),
        treatments,
        batteryId,
        incidentClass: classifyIncident({ kind: input.kind, treatments }).class,
        // The rule is applied now, whether or not it names anyone: only a more serious one tells again.
        alertedRule: ruleKey,
        reporterId: userId,
      },
      { transaction },
    );
    await queueIncidentAlert(incident, ruleKey, { teamName: team.name, publicUrl }, transaction);
    transaction.afterCommit(() => announceIncident(teamId, incident.id));
    return { incident, created: true };
  });
}
