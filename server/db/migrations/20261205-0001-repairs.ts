import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const instant = (allowNull = false) => ({ type: DataTypes.DATE(3), allowNull });
// A fresh object per column: Sequelize writes each column's name into its definition.
const user = (allowNull = false) => ({ type: DataTypes.UUID, allowNull, references: { model: 'users', key: 'id' } });
const repairId = () => ({ type: DataTypes.UUID, allowNull: false, references: { model: 'repairs', key: 'id' }, onDelete: 'CASCADE' });

/**
 * Repairs: the tickets of an event's board, their photos (the files live under DATA_DIR/uploads,
 * the rows say what they are), the history of every change, and the team's subsystem list (the
 * defaults until a lead edits it).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('repairs', {
    id,
    eventId: { type: DataTypes.UUID, allowNull: false, references: { model: 'events', key: 'id' }, onDelete: 'CASCADE' },
    title: { type: DataTypes.STRING(120), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: true },
    subsystem: { type: DataTypes.STRING(40), allowNull: false },
    severity: { type: DataTypes.STRING(16), allowNull: false },
    status: { type: DataTypes.STRING(16), allowNull: false },
    // Fractional keys are case-sensitive ('a' after 'Z'): a binary collation sorts them as the code does.
    orderKey: { type: 'VARCHAR(64) CHARACTER SET ascii COLLATE ascii_bin', allowNull: false },
    placedByHand: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    foundInMatchId: { type: DataTypes.UUID, allowNull: true, references: { model: 'matches', key: 'id' }, onDelete: 'SET NULL' },
    reporterId: user(),
    assigneeId: user(true),
    estimateMinutes: { type: DataTypes.INTEGER, allowNull: true },
    timeSpentMinutes: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    // string[] as JSON.
    partsUsed: { type: DataTypes.TEXT, allowNull: false },
    resolutionNote: { type: DataTypes.TEXT, allowNull: true },
    doneAt: instant(true),
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    // When it was reported.
    createdAt: instant(),
    updatedAt: instant(),
  });
  await qi.addIndex('repairs', ['eventId', 'status', 'orderKey'], { name: 'repairs_event_status_order' });

  await qi.createTable('repair_photos', {
    id,
    repairId: repairId(),
    uploadedById: user(),
    contentType: { type: DataTypes.STRING(16), allowNull: false },
    byteSize: { type: DataTypes.INTEGER, allowNull: false },
    width: { type: DataTypes.INTEGER, allowNull: true },
    height: { type: DataTypes.INTEGER, allowNull: true },
    hasThumb: { type: DataTypes.BOOLEAN, allowNull: false },
    createdAt: instant(),
  });
  await qi.addIndex('repair_photos', ['repairId', 'createdAt'], { name: 'repair_photos_repair_created' });

  await qi.createTable('repair_changes', {
    id,
    repairId: repairId(),
    kind: { type: DataTypes.STRING(16), allowNull: false },
    // {field: [before, after]} as JSON; descriptions and notes are stored whole.
    changes: { type: DataTypes.TEXT('medium'), allowNull: false },
    byId: user(),
    at: instant(),
  });
  await qi.addIndex('repair_changes', ['repairId', 'at'], { name: 'repair_changes_repair_at' });

  await qi.createTable('repair_settings', {
    teamId: { type: DataTypes.UUID, primaryKey: true, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    // [{key, label}] as JSON, in the team's order.
    subsystems: { type: DataTypes.TEXT, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false },
    createdAt: instant(),
    updatedAt: instant(),
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('repair_settings');
  await qi.dropTable('repair_changes');
  await qi.dropTable('repair_photos');
  await qi.dropTable('repairs');
}
