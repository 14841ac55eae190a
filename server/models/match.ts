import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { MatchLevel } from '../../shared/domain/timeline';
import type { Event } from './event';

/** One match of an event's schedule; `(eventId, level, number)` names it in imported files. */
export class Match extends Model<InferAttributes<Match>, InferCreationAttributes<Match>> {
  declare id: CreationOptional<string>;
  declare eventId: ForeignKey<Event['id']>;
  declare level: MatchLevel;
  declare number: number;
  declare scheduledStart: Date;
  declare red1: number;
  declare red2: number;
  declare red3: number;
  declare blue1: number;
  declare blue2: number;
  declare blue3: number;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    // A fresh object per column: Sequelize writes each column's name into its definition.
    const team = () => ({ type: DataTypes.INTEGER, allowNull: false });
    Match.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        level: { type: DataTypes.STRING(16), allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        scheduledStart: { type: DataTypes.DATE(3), allowNull: false },
        red1: team(),
        red2: team(),
        red3: team(),
        blue1: team(),
        blue2: team(),
        blue3: team(),
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'matches', version: true },
    );
  }
}
