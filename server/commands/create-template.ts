import type { CreateTemplateInput } from '../../shared/schemas/checks';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { ChecklistTemplate, ChecklistTemplateVersion, Team } from '../models';
import { presentTemplate } from '../presenters/checklist';
import { emitToTeam } from '../realtime/broadcast';
import { itemsWithIds } from './template-items';

/**
 * Adds a checklist template at version 1. Resending the same `id` returns the template the first
 * call made; an id in use by another team answers 409 `id_taken`.
 */
export async function createTemplate(teamId: string, userId: string, { id, name, phase, items }: CreateTemplateInput) {
  return inTransaction(async (transaction) => {
    // One template create per team at a time: a resent create waits, then finds the first.
    await Team.lockRow(teamId, transaction);
    if (id) {
      const existing = await ChecklistTemplate.findByPk(id, { transaction });
      if (existing?.teamId === teamId) return { template: await presentTemplate(existing, transaction), created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    const template = await ChecklistTemplate.create(
      { id, teamId, name, phase, version: 1, createdById: userId, updatedById: userId },
      { transaction },
    );
    await ChecklistTemplateVersion.create(
      { templateId: template.id, number: 1, name, phase, items: itemsWithIds(items, []), createdById: userId },
      { transaction },
    );
    transaction.afterCommit(() => emitToTeam(teamId, 'checks:templates-changed', { id: template.id }));
    return { template: await presentTemplate(template, transaction), created: true };
  });
}
