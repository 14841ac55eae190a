import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { SocTableName } from '../../shared/domain/battery-state';

/** A team's battery settings, one row once the team changes any (BATTERY_DEFAULTS until then). */
export class BatterySetting extends Model<InferAttributes<BatterySetting>, InferCreationAttributes<BatterySetting>> {
  declare teamId: string;
  declare socTable: SocTableName;
  declare watchIncreasePercent: number;
  declare replaceIncreasePercent: number;
  declare replaceAboveMilliohm: number | null;
  declare baselineReadings: number;
  declare minimumStartChargePercent: number;
  declare chargeFactor: number;
  declare chargeTailMinutes: number;
  declare peukertExponent: number;
  declare matchAverageCurrentA: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const setting = (allowNull = false) => ({ type: DataTypes.DOUBLE, allowNull });
    BatterySetting.init(
      {
        teamId: { type: DataTypes.UUID, primaryKey: true },
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
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'battery_settings' },
    );
  }
}
