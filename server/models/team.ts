import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize, type Transaction } from 'sequelize';

export class Team extends Model<InferAttributes<Team>, InferCreationAttributes<Team>> {
  declare id: CreationOptional<string>;
  declare number: number;
  declare name: string;
  declare currentEventId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /**
   * The team's row, locked for the transaction: writes that check a team-wide rule (the last
   * admin, a free label, an empty robot, a free bay) queue behind it, so two tablets can never
   * both pass the same check.
   */
  static lockRow(teamId: string, transaction: Transaction) {
    return Team.findByPk(teamId, { transaction, lock: transaction.LOCK.UPDATE, rejectOnEmpty: true });
  }

  static initModel(sequelize: Sequelize) {
    Team.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        number: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        currentEventId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'teams' },
    );
  }
}
