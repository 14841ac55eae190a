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
import type { BatteryStatus, Chemistry } from '../../shared/domain/battery-state';
import { notFound } from '../errors';
import { decimal } from './decimal';
import type { Team } from './team';

/** One of the team's robot batteries, named by the label painted on it. */
export class Battery extends Model<InferAttributes<Battery>, InferCreationAttributes<Battery>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare label: string;
  declare yearInService: number;
  declare nominalCapacityAh: number;
  declare chemistry: Chemistry;
  declare notes: string | null;
  declare status: BatteryStatus;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /** The team's battery, or 404: another team's is never told apart from a missing one. */
  static async ofTeam(teamId: string, id: string, { transaction, lock = false }: { transaction?: Transaction; lock?: boolean } = {}) {
    const battery = await Battery.findOne({ where: { id, teamId }, transaction, ...(lock && transaction ? { lock: transaction.LOCK.UPDATE } : {}) });
    if (!battery) throw notFound('Battery');
    return battery;
  }

  static initModel(sequelize: Sequelize) {
    Battery.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        label: { type: DataTypes.STRING(12), allowNull: false },
        yearInService: { type: DataTypes.INTEGER, allowNull: false },
        nominalCapacityAh: decimal('nominalCapacityAh', 6, 2),
        chemistry: { type: DataTypes.STRING(16), allowNull: false },
        notes: { type: DataTypes.STRING(500), allowNull: true },
        status: { type: DataTypes.STRING(16), allowNull: false },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'batteries', version: true },
    );
  }
}
