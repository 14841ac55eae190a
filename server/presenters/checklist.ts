import { Op, type Transaction } from 'sequelize';
import { evaluateMark, isComplete, progressOf, type ChecklistItem } from '../../shared/domain/checklist';
import { allianceOf } from '../../shared/domain/timeline';
import type { PersonJson, RunItemJson, RunJson, RunMatchJson, RunSummaryJson, TemplateJson } from '../../shared/schemas/checks';
import {
  ChecklistItemState,
  ChecklistTemplateVersion,
  decodeMarkValue,
  Event,
  Match,
  User,
  type ChecklistRun,
  type ChecklistTemplate,
} from '../models';
import { presentMatch } from './match';

type People = Map<string, PersonJson>;

/** Names of the people behind these ids, in one query. */
async function peopleOf(ids: Iterable<string | null>, transaction?: Transaction): Promise<People> {
  const wanted = [...new Set([...ids].filter((id): id is string => id !== null))];
  if (wanted.length === 0) return new Map();
  const users = await User.findAll({ where: { id: wanted }, attributes: ['id', 'name'], transaction });
  return new Map(users.map((user) => [user.id, { id: user.id, name: user.name }]));
}

const personOf = (people: People, id: string | null) => (id === null ? null : (people.get(id) ?? null));

/** Templates with their current versions' items, in the given order. */
export async function presentTemplates(templates: readonly ChecklistTemplate[], transaction?: Transaction): Promise<TemplateJson[]> {
  if (templates.length === 0) return [];
  const versions = await ChecklistTemplateVersion.findAll({
    where: { [Op.or]: templates.map((template) => ({ templateId: template.id, number: template.version })) },
    transaction,
  });
  const itemsOf = new Map(versions.map((version) => [version.templateId, version.items]));
  const people = await peopleOf(
    templates.map((template) => template.updatedById),
    transaction,
  );
  return templates.map((template) => ({
    id: template.id,
    name: template.name,
    phase: template.phase,
    version: template.version,
    items: itemsOf.get(template.id) ?? [],
    updatedAt: template.updatedAt.toISOString(),
    updatedBy: personOf(people, template.updatedById),
  }));
}

export const presentTemplate = async (template: ChecklistTemplate, transaction?: Transaction) =>
  (await presentTemplates([template], transaction))[0];

/** One item of a run with its current mark; `people` names who marked it. */
export function presentRunItem(item: ChecklistItem, state: ChecklistItemState | undefined, people: People): RunItemJson {
  const value = state ? decodeMarkValue(state.value) : null;
  return {
    ...item,
    value,
    note: state?.note ?? null,
    ...evaluateMark(item, value),
    markedBy: personOf(people, state?.markedById ?? null),
    markedAt: state?.markedAt ? state.markedAt.toISOString() : null,
  };
}

/**
 * Runs with their items (from the version each began with) and marks, in the given order.
 * A handful of queries whatever the number of runs.
 */
export async function presentRuns(runs: readonly ChecklistRun[], transaction?: Transaction): Promise<RunJson[]> {
  if (runs.length === 0) return [];
  // One after the other: queries of one transaction share its connection.
  const versions = await ChecklistTemplateVersion.findAll({ where: { id: runs.map((run) => run.templateVersionId) }, transaction });
  const states = await ChecklistItemState.findAll({ where: { runId: runs.map((run) => run.id) }, transaction });
  const matchIds = runs.map((run) => run.matchId).filter((id): id is string => id !== null);
  const matches = matchIds.length ? await Match.findAll({ where: { id: matchIds }, transaction }) : [];
  const events = await Event.findAll({ where: { id: runs.map((run) => run.eventId) }, attributes: ['id', 'teamNumber'], transaction });
  const people = await peopleOf(
    [...runs.flatMap((run) => [run.createdById, run.signedOffById]), ...states.map((state) => state.markedById)],
    transaction,
  );

  const versionOf = new Map(versions.map((version) => [version.id, version]));
  const matchOf = new Map(matches.map((match) => [match.id, match]));
  const teamNumberOf = new Map(events.map((event) => [event.id, event.teamNumber]));
  const stateOf = new Map(states.map((state) => [`${state.runId}/${state.itemId}`, state]));

  return runs.map((run) => {
    const version = versionOf.get(run.templateVersionId)!;
    const items = version.items.map((item) => presentRunItem(item, stateOf.get(`${run.id}/${item.id}`), people));
    const progress = progressOf(items);
    const match = run.matchId ? matchOf.get(run.matchId) : undefined;
    const runMatch: RunMatchJson | null = match
      ? { id: match.id, level: match.level, number: match.number, alliance: allianceOf(presentMatch(match, null), teamNumberOf.get(run.eventId)!) }
      : null;
    const signedOffBy = personOf(people, run.signedOffById);
    return {
      id: run.id,
      eventId: run.eventId,
      templateId: run.templateId,
      templateVersion: version.number,
      name: version.name,
      phase: version.phase,
      match: runMatch,
      items,
      progress,
      complete: isComplete(progress),
      signOff: run.signedOffAt && signedOffBy ? { by: signedOffBy, at: run.signedOffAt.toISOString(), reason: run.signOffReason } : null,
      createdAt: run.createdAt.toISOString(),
      createdBy: personOf(people, run.createdById)!,
    };
  });
}

export const presentRun = async (run: ChecklistRun, transaction?: Transaction) => (await presentRuns([run], transaction))[0];

/** A run in lists: everything but its items. */
export const summaryOf = ({ items: _items, ...summary }: RunJson): RunSummaryJson => summary;
