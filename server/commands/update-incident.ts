import type { Transaction } from 'sequelize';
import { alertRuleFor, isEscalation } from '../../shared/domain/incident-alert';
import { classifyIncident } from '../../shared/domain/incident-classification';
import type { UpdateIncidentInput } from '../../shared/schemas/incidents';
import { inTransaction } from '../db/transaction';
import { stale } from '../errors';
import { queueIncidentAlert } from '../incidents/alert';
import { announceIncident } from '../incidents/announce';
import { nextFollowUps } from '../incidents/follow-ups';
import { assertOurBattery, inListOrder } from '../incidents/references';
import { Battery, Incident, Team } from '../models';
import { presentIncident } from '../presenters/incident';
import { emitToTeam } from '../realtime/broadcast';
import { endOpenRecords } from './battery-closing';
import { assertInstant, assertNoInvalidFields } from './input-guards';

const same = (a: unknown, b: unknown) => a === b || JSON.stringify(a) === JSON.stringify(b);

/** Takes a battery out of service now (off its charger, out of the robot), as the batteries area does. */
async function retire(teamId: string, batteryId: string, userId: string, transaction: Transaction) {
  const battery = await Battery.ofTeam(teamId, batteryId, { transaction });
  if (battery.status === 'retired') return;
  await endOpenRecords(battery.id, userId, new Date(), transaction);
  battery.status = 'retired';
  await battery.save({ transaction });
  transaction.afterCommit(() => emitToTeam(teamId, 'batteries:changed', { id: battery.id }, { withScreens: true }));
}

/**
 * A safety captain's or mentor's edit of a report, refusing a stale `version` (409 with the
 * report as it is now, nothing written). Closing needs a closing note (sent now or already
 * stored) and may retire the battery the report names; reopening keeps the note. A change of
 * kind or care re-classes the report, and when that makes it more serious than what was
 * alerted (a later hospital visit), the safety contacts are alerted again.
 */
export async function updateIncident(teamId: string, userId: string, id: string, input: UpdateIncidentInput, { publicUrl }: { publicUrl: string }) {
  if (input.occurredAt) assertInstant('occurredAt', new Date(input.occurredAt));
  return inTransaction(async (transaction) => {
    const team = await Team.lockRow(teamId, transaction);
    const incident = await Incident.ofTeam(teamId, id, { transaction, lock: true });
    if (input.version !== incident.version) throw stale(await presentIncident(incident, 'full', transaction));
    const { version: _version, occurredAt, treatments, batteryId, followUps, status, closingNote, retireBattery, ...fields } = input;
    const now = new Date();
    const refused: Record<string, string> = {};

    for (const [field, value] of Object.entries(fields)) {
      if (value !== undefined && !same(incident.get(field), value)) incident.set(field as keyof typeof fields, value);
    }
    if (occurredAt !== undefined && occurredAt !== incident.occurredAt.toISOString()) incident.occurredAt = new Date(occurredAt);
    if (treatments !== undefined && !same(incident.treatments, inListOrder(treatments))) incident.treatments = inListOrder(treatments);
    if (batteryId !== undefined && batteryId !== incident.batteryId) {
      if (batteryId) await assertOurBattery(teamId, batteryId, transaction);
      incident.batteryId = batteryId;
    }
    if (followUps !== undefined) {
      const next = await nextFollowUps(teamId, incident.followUps, followUps, now, transaction);
      Object.assign(refused, next.fields);
      if (!same(incident.followUps, next.followUps)) incident.followUps = next.followUps;
    }
    if (closingNote !== undefined && closingNote !== incident.closingNote) incident.closingNote = closingNote;
    if (status === 'closed' && incident.status === 'open') incident.set({ status, closedAt: now, closedById: userId });
    if (status === 'open' && incident.status === 'closed') incident.set({ status, closedAt: null, closedById: null });
    // A closed report always says how it was closed.
    if (incident.status === 'closed' && !incident.closingNote) refused.closingNote = 'Say how it was closed before closing the report';
    if (retireBattery && status !== 'closed') refused.retireBattery = 'Only when closing the report';
    else if (retireBattery && !incident.batteryId) refused.retireBattery = 'The report names no battery';
    assertNoInvalidFields(refused);

    incident.incidentClass = classifyIncident(incident).class;
    const ruleKey = alertRuleFor(incident);
    const escalated = isEscalation(incident.alertedRule, ruleKey);
    if (escalated) incident.alertedRule = ruleKey;
    if (retireBattery) await retire(teamId, incident.batteryId!, userId, transaction);
    // A body that changes nothing writes nothing and keeps the version.
    if (incident.changed()) {
      await incident.save({ transaction });
      if (escalated) await queueIncidentAlert(incident, ruleKey, { teamName: team.name, publicUrl }, transaction);
      transaction.afterCommit(() => announceIncident(teamId, incident.id));
    }
    return presentIncident(incident, 'full', transaction);
  });
}
