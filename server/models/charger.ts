import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
  type Transaction,
} from 'sequelize';
import { notFound } from '../errors';
import { decimal } from './decimal';
import type { Team } from './team';

/** A charger of the team with its bays, each charging one battery at `currentPerBayA`. */
export class Charger extends Model<InferAttributes<Charger>, InferCreationAttributes<Charger>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare name: string;
  declare bays: number;
  declare currentPerBayA: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /** The team's charger, or 404. */
  static async ofTeam(teamId: string, id: string, { transaction }: { transaction?: Transaction } = {}) {
    const charger = await Charger.findOne({ where: { id, teamId }, transaction });
    if (!charger) throw notFound('Charger');
    return charger;
  }

  static initModel(sequelize: Sequelize) {
    Charger.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(40), allowNull: false },
        bays: { type: DataTypes.INTEGER, allowNull: false },
        currentPerBayA: decimal('currentPerBayA', 5, 2),
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'chargers' },
    );
  }
}
