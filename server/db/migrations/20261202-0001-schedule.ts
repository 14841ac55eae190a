import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const instant = (allowNull = false) => ({ type: DataTypes.DATE(3), allowNull });
const timestamps = { createdAt: instant(), updatedAt: instant() };
// A fresh object per column: Sequelize writes each column's name into its definition.
const team = () => ({ type: DataTypes.INTEGER, allowNull: false });
const eventId = { type: DataTypes.UUID, allowNull: false, references: { model: 'events', key: 'id' }, onDelete: 'CASCADE' };

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('events', 'queueLeadMatches', { type: DataTypes.INTEGER, allowNull: true, defaultValue: 2 });
  await qi.addColumn('events', 'queueLeadMinutes', { type: DataTypes.INTEGER, allowNull: true });
  await qi.addColumn('events', 'matchLengthSeconds', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 150 });
  await qi.addColumn('events', 'returnToPitMinutes', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 5 });
  await qi.addColumn('events', 'tightTurnaroundMinutes', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 20 });
  await qi.addColumn('events', 'allowRunningAhead', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
  // The timeline reads one queue lead; the database keeps a second one from creeping in.
  await qi.sequelize.query(
    'ALTER TABLE events ADD CONSTRAINT events_one_queue_lead CHECK ((queueLeadMatches IS NULL) <> (queueLeadMinutes IS NULL))',
  );

  await qi.createTable('matches', {
    id,
    eventId,
    level: { type: DataTypes.STRING(16), allowNull: false },
    number: { type: DataTypes.INTEGER, allowNull: false },
    scheduledStart: instant(),
    red1: team(),
    red2: team(),
    red3: team(),
    blue1: team(),
    blue2: team(),
    blue3: team(),
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.addIndex('matches', ['eventId', 'level', 'number'], { unique: true, name: 'matches_event_level_number' });

  await qi.createTable('field_marks', {
    id,
    eventId,
    matchId: { type: DataTypes.UUID, allowNull: false, references: { model: 'matches', key: 'id' }, onDelete: 'CASCADE' },
    startedAt: instant(),
    markedById: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' } },
    undoneAt: instant(true),
    undoneById: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' } },
    ...timestamps,
  });
  await qi.addIndex('field_marks', ['eventId', 'createdAt'], { name: 'field_marks_event_created' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('field_marks');
  await qi.dropTable('matches');
  await qi.sequelize.query('ALTER TABLE events DROP CONSTRAINT events_one_queue_lead');
  for (const column of ['allowRunningAhead', 'tightTurnaroundMinutes', 'returnToPitMinutes', 'matchLengthSeconds', 'queueLeadMinutes', 'queueLeadMatches']) {
    await qi.removeColumn('events', column);
  }
}
