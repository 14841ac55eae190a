import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Battery } from './battery';
import { decimal } from './decimal';

/** What the analyzer showed for one battery at one moment, and who read it. Append-only. */
export class BatteryReading extends Model<InferAttributes<BatteryReading>, InferCreationAttributes<BatteryReading>> {
  declare id: CreationOptional<string>;
  declare batteryId: ForeignKey<Battery['id']>;
  declare voltage: number;
  declare internalResistanceMilliohm: number;
  declare rested: boolean;
  declare restedMinutes: number | null;
  declare temperatureC: number | null;
  declare takenAt: Date;
  declare takenById: string;
  /** The use it was read before or after, when the reader said so. */
  declare useId: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    BatteryReading.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        voltage: decimal('voltage', 5, 3),
        internalResistanceMilliohm: decimal('internalResistanceMilliohm', 7, 2),
        rested: { type: DataTypes.BOOLEAN, allowNull: false },
        restedMinutes: { type: DataTypes.INTEGER, allowNull: true },
        temperatureC: decimal('temperatureC', 4, 1, true),
        takenAt: { type: DataTypes.DATE(3), allowNull: false },
        takenById: { type: DataTypes.UUID, allowNull: false },
        useId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'battery_readings', updatedAt: false },
    );
  }
}
