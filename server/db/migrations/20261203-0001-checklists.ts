import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const instant = (allowNull = false) => ({ type: DataTypes.DATE(3), allowNull });
// A fresh object per column: Sequelize writes each column's name into its definition.
const user = (allowNull = false) => ({ type: DataTypes.UUID, allowNull, references: { model: 'users', key: 'id' } });
const itemId = () => ({ type: DataTypes.STRING(40), allowNull: false });
// A mark's value as JSON (true, a number or a string); null when un-marked.
const value = () => ({ type: DataTypes.TEXT, allowNull: true });
const note = () => ({ type: DataTypes.STRING(200), allowNull: true });

/**
 * Checklists: templates with immutable versions (a run keeps the version it began with), runs,
 * one state row per item of a run, and the append-only history of every mark and un-mark.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('checklist_templates', {
    id,
    teamId: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    phase: { type: DataTypes.STRING(16), allowNull: false },
    // The current version's number; also the optimistic-locking token editors send back.
    version: { type: DataTypes.INTEGER, allowNull: false },
    createdById: user(),
    updatedById: user(),
    createdAt: instant(),
    updatedAt: instant(),
  });
  await qi.addIndex('checklist_templates', ['teamId', 'phase', 'name'], { name: 'checklist_templates_team_phase_name' });

  await qi.createTable('checklist_template_versions', {
    id,
    templateId: { type: DataTypes.UUID, allowNull: false, references: { model: 'checklist_templates', key: 'id' }, onDelete: 'CASCADE' },
    number: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    phase: { type: DataTypes.STRING(16), allowNull: false },
    // The ChecklistItem[] snapshot as JSON: 100 items with help texts outgrow a plain TEXT.
    items: { type: DataTypes.TEXT('medium'), allowNull: false },
    createdById: user(),
    createdAt: instant(),
  });
  await qi.addIndex('checklist_template_versions', ['templateId', 'number'], { unique: true, name: 'checklist_template_versions_number' });

  await qi.createTable('checklist_runs', {
    id,
    eventId: { type: DataTypes.UUID, allowNull: false, references: { model: 'events', key: 'id' }, onDelete: 'CASCADE' },
    templateId: { type: DataTypes.UUID, allowNull: false, references: { model: 'checklist_templates', key: 'id' }, onDelete: 'CASCADE' },
    templateVersionId: { type: DataTypes.UUID, allowNull: false, references: { model: 'checklist_template_versions', key: 'id' } },
    // A run outlives its match's removal as a run of no match, with its marks.
    matchId: { type: DataTypes.UUID, allowNull: true, references: { model: 'matches', key: 'id' }, onDelete: 'SET NULL' },
    createdById: user(),
    signedOffAt: instant(true),
    signedOffById: user(true),
    signOffReason: { type: DataTypes.STRING(500), allowNull: true },
    createdAt: instant(),
    updatedAt: instant(),
  });
  // One run per template per match; runs of no match (NULL) may repeat.
  await qi.addIndex('checklist_runs', ['templateId', 'matchId'], { unique: true, name: 'checklist_runs_template_match' });
  await qi.addIndex('checklist_runs', ['eventId', 'createdAt'], { name: 'checklist_runs_event_created' });
  await qi.addIndex('checklist_runs', ['matchId'], { name: 'checklist_runs_match' });

  // One row per item from the run's start: a mark is an UPDATE by primary key, so marks of
  // different items never take gap locks on each other.
  await qi.createTable('checklist_item_states', {
    runId: { type: DataTypes.UUID, primaryKey: true, allowNull: false, references: { model: 'checklist_runs', key: 'id' }, onDelete: 'CASCADE' },
    itemId: { ...itemId(), primaryKey: true },
    value: value(),
    note: note(),
    markedById: user(true),
    markedAt: instant(true),
  });

  await qi.createTable('checklist_marks', {
    id,
    runId: { type: DataTypes.UUID, allowNull: false, references: { model: 'checklist_runs', key: 'id' }, onDelete: 'CASCADE' },
    itemId: itemId(),
    value: value(),
    note: note(),
    markedById: user(),
    markedAt: instant(),
  });
  await qi.addIndex('checklist_marks', ['runId', 'itemId', 'markedAt'], { name: 'checklist_marks_run_item' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('checklist_marks');
  await qi.dropTable('checklist_item_states');
  await qi.dropTable('checklist_runs');
  await qi.dropTable('checklist_template_versions');
  await qi.dropTable('checklist_templates');
}
