import type { Transaction } from 'sequelize';
import { allianceOf } from '../../shared/domain/timeline';
import type { CreateRunInput } from '../../shared/schemas/checks';
import { inTransaction } from '../db/transaction';
import { HttpError, notFound } from '../errors';
import { ChecklistRun, ChecklistTemplate, ChecklistTemplateVersion, Event, Match } from '../models';
import { presentRun } from '../presenters/checklist';
import { presentMatch } from '../presenters/match';
import { emitToEvent } from '../realtime/broadcast';
import { createItemStates } from './item-states';

/**
 * Starts a run of the template's current version, with one empty state row per item. The caller
 * holds the event's row lock, so that two starts for one match cannot both pass the check for
 * an existing run. Answers the existing run when the template already has one for the match.
 */
export async function startRun(
  { event, template, matchId, userId, id }: { event: Event; template: ChecklistTemplate; matchId: string | null; userId: string; id?: string },
  transaction: Transaction,
) {
  if (matchId) {
    const existing = await ChecklistRun.findOne({ where: { templateId: template.id, matchId }, transaction });
    if (existing) return { run: existing, created: false };
  }
  const version = await ChecklistTemplateVersion.findOne({
    where: { templateId: template.id, number: template.version },
    transaction,
    rejectOnEmpty: true,
  });
  const run = await ChecklistRun.create(
    { id, eventId: event.id, templateId: template.id, templateVersionId: version.id, matchId, createdById: userId },
    { transaction },
  );
  await createItemStates(run.id, version.items, transaction);
  transaction.afterCommit(() => emitToEvent(event.id, 'checks:run-started', { eventId: event.id, runId: run.id, matchId }));
  return { run, created: true };
}

/**
 * Starts a run on demand. Idempotent twice over: a resent `id` answers the run it made, and a
 * template has one run per match (a second start answers the first run). An id in use by another
 * record answers 409 `id_taken`.
 */
export async function createRun(teamId: string, eventId: string, userId: string, { id, templateId, matchId }: CreateRunInput) {
  return inTransaction(async (transaction) => {
    // The event's row lock also orders this against field marks, which start runs themselves.
    const event = await Event.ofTeam(teamId, eventId, { transaction, lock: true });
    if (id) {
      const existing = await ChecklistRun.findByPk(id, { transaction });
      if (existing?.eventId === event.id) return { run: await presentRun(existing, transaction), created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    const template = await ChecklistTemplate.ofTeam(teamId, templateId, { transaction });
    if (matchId) {
      const match = await Match.findOne({ where: { id: matchId, eventId: event.id }, transaction });
      if (!match) throw notFound('Match');
      if (allianceOf(presentMatch(match, null), event.teamNumber) === null) {
        throw new HttpError(400, 'invalid', 'Check these fields: matchId', { fields: { matchId: 'We do not play in this match' } });
      }
    }
    const { run, created } = await startRun({ event, template, matchId, userId, id }, transaction);
    return { run: await presentRun(run, transaction), created };
  });
}
