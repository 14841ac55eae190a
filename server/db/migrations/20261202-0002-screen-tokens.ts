import { DataTypes, type QueryInterface } from 'sequelize';

const instant = (allowNull = false) => ({ type: DataTypes.DATE(3), allowNull });

/** Pit screens: a TV reads the board through a revocable token; only the token's hash is kept. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('screen_tokens', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    teamId: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(60), allowNull: false },
    // sha256 hex of the token: a leaked database does not open any screen.
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    createdById: { type: DataTypes.UUID, allowNull: false },
    revokedAt: instant(true),
    createdAt: instant(),
    updatedAt: instant(),
  });
  await qi.addIndex('screen_tokens', ['teamId', 'createdAt'], { name: 'screen_tokens_team_created' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('screen_tokens');
}
