import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const instant = (allowNull = false) => ({ type: DataTypes.DATE(3), allowNull });
// A fresh object per column: Sequelize writes each column's name into its definition.
const user = (allowNull = false) => ({ type: DataTypes.UUID, allowNull, references: { model: 'users', key: 'id' } });
const teamId = () => ({ type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' });
const batteryId = () => ({ type: DataTypes.UUID, allowNull: false, references: { model: 'batteries', key: 'id' }, onDelete: 'CASCADE' });
const setting = (allowNull = false) => ({ type: DataTypes.DOUBLE, allowNull });

/**
 * Batteries: the fleet, its analyzer readings, its uses in the robot, the team's chargers and
 * what charged on which bay, and the team's battery settings (defaults when it has no row).
 * Measured values are DECIMAL so that what the analyzer showed is what is stored.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('batteries', {
    id,
    teamId: teamId(),
    label: { type: DataTypes.STRING(12), allowNull: false },
    yearInService: { type: DataTypes.INTEGER, allowNull: false },
    nominalCapacityAh: { type: DataTypes.DECIMAL(6, 2), allowNull: false },
    chemistry: { type: DataTypes.STRING(16), allowNull: false },
    notes: { type: DataTypes.STRING(500), allowNull: true },
    status: { type: DataTypes.STRING(16), allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    createdAt: instant(),
    updatedAt: instant(),
  });
  // The label painted on it names one battery in the team (compared without case, as the collation does).
  await qi.addIndex('batteries', ['teamId', 'label'], { unique: true, name: 'batteries_team_label' });

  await qi.createTable('battery_uses', {
    id,
    batteryId: batteryId(),
    eventId: { type: DataTypes.UUID, allowNull: false, references: { model: 'events', key: 'id' }, onDelete: 'CASCADE' },
    matchId: { type: DataTypes.UUID, allowNull: false, references: { model: 'matches', key: 'id' }, onDelete: 'CASCADE' },
    installedAt: instant(),
    installedById: user(),
    removedAt: instant(true),
    removedById: user(true),
  });
  await qi.addIndex('battery_uses', ['batteryId', 'installedAt'], { name: 'battery_uses_battery_installed' });
  await qi.addIndex('battery_uses', ['eventId', 'matchId'], { name: 'battery_uses_event_match' });

  await qi.createTable('battery_readings', {
    id,
    batteryId: batteryId(),
    voltage: { type: DataTypes.DECIMAL(5, 3), allowNull: false },
    internalResistanceMilliohm: { type: DataTypes.DECIMAL(7, 2), allowNull: false },
    rested: { type: DataTypes.BOOLEAN, allowNull: false },
    restedMinutes: { type: DataTypes.INTEGER, allowNull: true },
    temperatureC: { type: DataTypes.DECIMAL(4, 1), allowNull: true },
    takenAt: instant(),
    takenById: user(),
    useId: { type: DataTypes.UUID, allowNull: true, references: { model: 'battery_uses', key: 'id' }, onDelete: 'SET NULL' },
    createdAt: instant(),
  });
  await qi.addIndex('battery_readings', ['batteryId', 'takenAt'], { name: 'battery_readings_battery_taken' });

  await qi.createTable('chargers', {
    id,
    teamId: teamId(),
    name: { type: DataTypes.STRING(40), allowNull: false },
    bays: { type: DataTypes.INTEGER, allowNull: false },
    currentPerBayA: { type: DataTypes.DECIMAL(5, 2), allowNull: false },
    createdAt: instant(),
    updatedAt: instant(),
  });
  await qi.addIndex('chargers', ['teamId', 'createdAt'], { name: 'chargers_team_created' });

  await qi.createTable('charging_sessions', {
    id,
    batteryId: batteryId(),
    chargerId: { type: DataTypes.UUID, allowNull: false, references: { model: 'chargers', key: 'id' }, onDelete: 'CASCADE' },
    bay: { type: DataTypes.INTEGER, allowNull: false },
    startedAt: instant(),
    endedAt: instant(true),
    startedById: user(),
    endedById: user(true),
    expectedEndAt: instant(true),
  });
  await qi.addIndex('charging_sessions', ['batteryId', 'startedAt'], { name: 'charging_sessions_battery_started' });
  await qi.addIndex('charging_sessions', ['chargerId', 'bay', 'endedAt'], { name: 'charging_sessions_charger_bay' });

  await qi.createTable('battery_settings', {
    teamId: { ...teamId(), primaryKey: true },
    socTable: { type: DataTypes.STRING(8), allowNull: false },
    watchIncreasePercent: setting(),
    replaceIncreasePercent: setting(),
    replaceAboveMilliohm: setting(true),
    baselineReadings: { type: DataTypes.INTEGER, allowNull: false },
    minimumStartChargePercent: setting(),
    chargeFactor: setting(),
    chargeTailMinutes: { type: DataTypes.INTEGER, allowNull: false },
    peukertExponent: setting(),
    matchAverageCurrentA: setting(),
    createdAt: instant(),
    updatedAt: instant(),
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('battery_settings');
  await qi.dropTable('charging_sessions');
  await qi.dropTable('chargers');
  await qi.dropTable('battery_readings');
  await qi.dropTable('battery_uses');
  await qi.dropTable('batteries');
}
