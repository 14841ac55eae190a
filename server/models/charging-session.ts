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
import type { Charger } from './charger';

/** A battery on one bay of a charger: open (endedAt null) while it charges. */
export class ChargingSession extends Model<InferAttributes<ChargingSession>, InferCreationAttributes<ChargingSession>> {
  declare id: CreationOptional<string>;
  declare batteryId: ForeignKey<Battery['id']>;
  declare chargerId: ForeignKey<Charger['id']>;
  /** 1-based within its charger. */
  declare bay: number;
  declare startedAt: Date;
  declare endedAt: CreationOptional<Date | null>;
  declare startedById: string;
  declare endedById: CreationOptional<string | null>;
  /** REFERENCES §4 estimate from the battery's charge at the start; null only if it could not be made. */
  declare expectedEndAt: Date | null;

  static initModel(sequelize: Sequelize) {
    ChargingSession.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        bay: { type: DataTypes.INTEGER, allowNull: false },
        startedAt: { type: DataTypes.DATE(3), allowNull: false },
        endedAt: { type: DataTypes.DATE(3), allowNull: true },
        startedById: { type: DataTypes.UUID, allowNull: false },
        endedById: { type: DataTypes.UUID, allowNull: true },
        expectedEndAt: { type: DataTypes.DATE(3), allowNull: true },
      },
      { sequelize, tableName: 'charging_sessions', timestamps: false },
    );
  }
}
