import type { UpdateTemplateInput } from '../../shared/schemas/checks';
import { inTransaction } from '../db/transaction';
import { stale } from '../errors';
import { ChecklistTemplate, ChecklistTemplateVersion } from '../models';
import { presentTemplate } from '../presenters/checklist';
import { emitToTeam } from '../realtime/broadcast';
import { itemsWithIds, sameItems } from './template-items';

/**
 * Edits a template by writing its next version; runs keep the version they began with. A stale
 * `version` answers 409 with the current template; an edit that changes nothing writes nothing.
 */
export async function updateTemplate(teamId: string, userId: string, id: string, { version, ...changes }: UpdateTemplateInput) {
  return inTransaction(async (transaction) => {
    const template = await ChecklistTemplate.ofTeam(teamId, id, { transaction, lock: true });
    if (version !== undefined && version !== template.version) throw stale(await presentTemplate(template, transaction));
    const current = await ChecklistTemplateVersion.findOne({
      where: { templateId: template.id, number: template.version },
      transaction,
      rejectOnEmpty: true,
    });
    const name = changes.name ?? current.name;
    const phase = changes.phase ?? current.phase;
    const items = changes.items ? itemsWithIds(changes.items, current.items) : current.items;
    if (name === current.name && phase === current.phase && sameItems(items, current.items)) {
      return presentTemplate(template, transaction);
    }
    const number = template.version + 1;
    await ChecklistTemplateVersion.create({ templateId: template.id, number, name, phase, items, createdById: userId }, { transaction });
    await template.update({ name, phase, version: number, updatedById: userId }, { transaction });
    transaction.afterCommit(() => emitToTeam(teamId, 'checks:templates-changed', { id: template.id }));
    return presentTemplate(template, transaction);
  });
}
