import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const instant = (allowNull = false) => ({ type: DataTypes.DATE(3), allowNull });
const timestamps = { createdAt: instant(), updatedAt: instant() };

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('teams', {
    id,
    number: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    currentEventId: { type: DataTypes.UUID, allowNull: true },
    ...timestamps,
  });
  await qi.createTable('users', {
    id,
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(80), allowNull: false },
    passwordHash: { type: DataTypes.STRING(100), allowNull: false },
    ...timestamps,
  });
  await qi.createTable('memberships', {
    id,
    teamId: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    userId: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    roles: { type: DataTypes.STRING(120), allowNull: false },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.addIndex('memberships', ['teamId', 'userId'], { unique: true, name: 'memberships_team_user' });
  await qi.createTable('events', {
    id,
    teamId: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(120), allowNull: false },
    venue: { type: DataTypes.STRING(160), allowNull: false },
    timeZone: { type: DataTypes.STRING(64), allowNull: false },
    startDate: { type: DataTypes.DATEONLY, allowNull: false },
    endDate: { type: DataTypes.DATEONLY, allowNull: false },
    teamNumber: { type: DataTypes.INTEGER, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.addIndex('events', ['teamId', 'startDate'], { name: 'events_team_start' });
  await qi.addConstraint('teams', {
    type: 'foreign key',
    fields: ['currentEventId'],
    name: 'teams_current_event',
    references: { table: 'events', field: 'id' },
    onDelete: 'SET NULL',
    onUpdate: 'CASCADE',
  });
  await qi.createTable('sessions', {
    sid: { type: DataTypes.STRING(36), primaryKey: true },
    userId: { type: DataTypes.UUID, allowNull: true },
    expires: instant(true),
    data: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('sessions', ['userId'], { name: 'sessions_user' });
  await qi.addIndex('sessions', ['expires'], { name: 'sessions_expires' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('sessions');
  await qi.removeConstraint('teams', 'teams_current_event');
  await qi.dropTable('events');
  await qi.dropTable('memberships');
  await qi.dropTable('users');
  await qi.dropTable('teams');
}
