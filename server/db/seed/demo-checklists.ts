import type { Transaction } from 'sequelize';
import type { ChecklistItem, MarkValue } from '../../../shared/domain/checklist';
import type { Alliance } from '../../../shared/domain/timeline';
import type { Role } from '../../../shared/roles';
import { createTemplateSchema, type CreateTemplateInput } from '../../../shared/schemas/checks';
import { createItemStates, recordMark } from '../../commands/item-states';
import { itemsWithIds } from '../../commands/template-items';
import { LAST_MATCH_AFTER_VOLTS } from './demo-batteries';
import {
  ChecklistRun,
  ChecklistTemplate,
  ChecklistTemplateVersion,
  type Event,
  type Team,
  type User,
} from '../../models';

/**
 * The demo team's checklists, in our own words, as a lead would type them into the editor (the
 * editor's schema checks them), and a few runs: the inspection passed this morning, our last
 * match's checks, and the pre-match check of our next match half done.
 */
export const DEMO_TEMPLATES = [
  {
    name: 'Before every match',
    phase: 'pre_match',
    items: [
      { label: 'Bumpers match our alliance colour', help: 'Both sides, and the number plates read the same colour', kind: 'choice', required: true, options: ['Red', 'Blue'], role: 'crew', purpose: 'bumper_colour' },
      { label: 'Battery latched and strapped', help: 'Tug the strap: the battery must not shift', kind: 'tick', required: true, role: 'battery' },
      { label: 'Main breaker on', kind: 'tick', required: true },
      { label: 'Radio and its cables secured', help: 'Power and network plugs clipped in, cables tied back from anything that moves', kind: 'tick', required: true },
      { label: 'Stored air pressure', help: 'Read the gauge on the storage tank', kind: 'number', required: true, min: 100, max: 120, unit: 'psi' },
      { label: 'No loose fasteners', help: 'Run a hand over the drive rails, the arm pivot and the bumper mounts', kind: 'tick', required: true },
      { label: 'Code version confirmed', help: 'The build number the drive laptop shows', kind: 'text', required: true },
      { label: 'Camera lens wiped', kind: 'tick', required: false },
      { label: 'Spare battery waiting on the cart', kind: 'tick', required: false, role: 'battery' },
    ],
  },
  {
    name: 'After every match',
    phase: 'post_match',
    items: [
      { label: 'Battery out and on a charger', kind: 'tick', required: true, role: 'battery' },
      { label: 'Battery voltage as it came off', kind: 'number', required: false, unit: 'V' },
      { label: 'Walk-around for damage', help: 'Bent brackets, cracked plates, rubbing belts', kind: 'tick', required: true },
      { label: 'What needs fixing', kind: 'text', required: false },
      { label: 'Air tanks topped up', kind: 'tick', required: true },
    ],
  },
  {
    name: 'Robot inspection',
    phase: 'inspection',
    items: [
      { label: 'Fits inside the sizing frame', kind: 'tick', required: true },
      { label: 'Weight without bumpers', kind: 'number', required: true, max: 56, unit: 'kg' },
      { label: 'Both bumper sets in the cart', kind: 'tick', required: true },
      { label: 'Main breaker easy to reach', kind: 'tick', required: true },
      { label: 'Pressure relief valve tested', kind: 'tick', required: true },
      { label: 'Sharp edges taped or filed', kind: 'tick', required: true },
      { label: 'Team number readable on every side', kind: 'tick', required: true },
    ],
  },
  {
    name: 'Pack-out',
    phase: 'pack_out',
    items: [
      { label: 'Batteries off the chargers and in their crate', kind: 'tick', required: true, role: 'battery' },
      { label: 'Tools counted back into the toolbox', kind: 'tick', required: true },
      { label: 'Spare parts bin closed and labelled', kind: 'tick', required: true },
      { label: 'Robot strapped to its cart', kind: 'tick', required: true },
      { label: 'Pit swept and bins emptied', kind: 'tick', required: true },
      { label: 'Crates loaded', kind: 'number', required: false, unit: 'crates' },
      { label: 'Anything left behind', kind: 'text', required: false },
    ],
  },
] as const;

/** A match of the demo schedule as the checklists need it, in schedule order. */
export interface DemoChecklistMatch {
  id: string;
  scheduledStart: Date;
  startedAt: Date | null;
  alliance: Alliance | null;
}

type Users = Record<Role, User>;
const MINUTE_MS = 60_000;
const minutesBefore = (at: Date, minutes: number) => new Date(at.getTime() - minutes * MINUTE_MS);
const colourOf = (alliance: Alliance) => (alliance === 'red' ? 'Red' : 'Blue');

export async function seedDemoChecklists(
  { team, event, users, matches, now }: { team: Team; event: Event; users: Users; matches: readonly DemoChecklistMatch[]; now: Date },
  transaction: Transaction,
) {
  const templates = new Map<string, { template: ChecklistTemplate; version: ChecklistTemplateVersion }>();
  for (const body of DEMO_TEMPLATES) {
    const { name, phase, items }: CreateTemplateInput = createTemplateSchema.parse(body);
    const template = await ChecklistTemplate.create(
      { teamId: team.id, name, phase, version: 1, createdById: users.lead.id, updatedById: users.lead.id },
      { transaction },
    );
    const version = await ChecklistTemplateVersion.create(
      { templateId: template.id, number: 1, name, phase, items: itemsWithIds(items, []), createdById: users.lead.id },
      { transaction },
    );
    templates.set(name, { template, version });
  }

  async function run(name: string, matchId: string | null, createdAt: Date, createdBy: User) {
    const { template, version } = templates.get(name)!;
    const created = await ChecklistRun.create(
      { eventId: event.id, templateId: template.id, templateVersionId: version.id, matchId, createdById: createdBy.id, createdAt, updatedAt: createdAt },
      { transaction, silent: true },
    );
    await createItemStates(created.id, version.items, transaction);
    const itemOf = (label: string): ChecklistItem => version.items.find((item) => item.label === label)!;
    const mark = async (label: string, value: MarkValue, by: User, markedAt: Date, note: string | null = null) => {
      await recordMark({ runId: created.id, itemId: itemOf(label).id, value, note, markedById: by.id, markedAt }, transaction);
    };
    return { run: created, mark };
  }

  // This morning's inspection: passed, and signed off.
  const firstStart = matches[0]?.scheduledStart ?? now;
  const inspection = await run('Robot inspection', null, minutesBefore(firstStart, 120), users.lead);
  const inspectedAt = minutesBefore(firstStart, 100);
  for (const label of ['Fits inside the sizing frame', 'Both bumper sets in the cart', 'Main breaker easy to reach', 'Pressure relief valve tested', 'Sharp edges taped or filed', 'Team number readable on every side']) {
    await inspection.mark(label, true, users.crew, inspectedAt);
  }
  await inspection.mark('Weight without bumpers', 53.4, users.lead, inspectedAt);
  await inspection.run.update({ signedOffAt: minutesBefore(firstStart, 95), signedOffById: users.lead.id }, { transaction });

  const ours = matches.filter((match) => match.alliance !== null);
  const played = ours.filter((match) => match.startedAt !== null).at(-1);
  const next = ours.find((match) => match.startedAt === null);

  if (played?.startedAt && played.alliance) {
    // Our last match: its pre-match check done in full before it, the post-match one under way.
    const before = await run('Before every match', played.id, minutesBefore(played.startedAt, 45), users.lead);
    const checkedAt = minutesBefore(played.startedAt, 15);
    await before.mark('Bumpers match our alliance colour', colourOf(played.alliance), users.crew, checkedAt);
    // The battery items too: the battery handler's role does not mark checklists (only admin, lead and crew may).
    for (const label of ['Main breaker on', 'Radio and its cables secured', 'No loose fasteners', 'Camera lens wiped', 'Battery latched and strapped', 'Spare battery waiting on the cart']) {
      await before.mark(label, true, users.crew, checkedAt);
    }
    await before.mark('Stored air pressure', 118, users.crew, checkedAt);
    await before.mark('Code version confirmed', 'build 41', users.lead, checkedAt);

    const backAt = new Date(played.startedAt.getTime() + 8 * MINUTE_MS);
    if (backAt < now) {
      const after = await run('After every match', played.id, backAt, users.crew);
      await after.mark('Battery out and on a charger', true, users.crew, backAt);
      await after.mark('Battery voltage as it came off', LAST_MATCH_AFTER_VOLTS, users.crew, backAt);
      await after.mark('Walk-around for damage', true, users.crew, backAt, 'Left intake bracket slightly bent');
    }
  }

  if (played?.startedAt && next?.alliance) {
    // Our next match: started automatically at our last match's field mark, half done.
    const upcoming = await run('Before every match', next.id, played.startedAt, users.lead);
    await upcoming.mark('Bumpers match our alliance colour', colourOf(next.alliance), users.crew, minutesBefore(now, 6));
    await upcoming.mark('Battery latched and strapped', true, users.crew, minutesBefore(now, 5));
    await upcoming.mark('Main breaker on', true, users.crew, minutesBefore(now, 4));
    await upcoming.mark('Stored air pressure', 112, users.crew, minutesBefore(now, 3), 'Topped up after the last match');
    await upcoming.mark('Code version confirmed', 'build 42', users.lead, minutesBefore(now, 2));
  }
}
