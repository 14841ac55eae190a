import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Battery } from './battery';

/** A battery in the robot for one of our matches: open (removedAt null) until it comes out. */
export class BatteryUse extends Model<InferAttributes<BatteryUse>, InferCreationAttributes<BatteryUse>> {
  declare id: CreationOptional<string>;
  declare batteryId: ForeignKey<Battery['id']>;
  declare eventId: string;
  declare matchId: string;
  declare installedAt: Date;
  declare installedById: string;
  declare removedAt: CreationOptional<Date | null>;
  declare removedById: CreationOptional<string | null>;
  /** Loaded when included. */
  declare battery?: NonAttribute<Battery>;

  static initModel(sequelize: Sequelize) {
    BatteryUse.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        eventId: { type: DataTypes.UUID, allowNull: false },
        matchId: { type: DataTypes.UUID, allowNull: false },
        installedAt: { type: DataTypes.DATE(3), allowNull: false },
        installedById: { type: DataTypes.UUID, allowNull: false },
        removedAt: { type: DataTypes.DATE(3), allowNull: true },
        removedById: { type: DataTypes.UUID, allowNull: true },
      },
      { sequelize, tableName: 'battery_uses', timestamps: false },
    );
  }
}
