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
import type { Event } from './event';
import type { Match } from './match';
import type { User } from './user';

/**
 * "This match is on the field now", tapped by a lead. Kept when undone (undoneAt/undoneById),
 * so the log says who marked and who took it back.
 */
export class FieldMark extends Model<InferAttributes<FieldMark>, InferCreationAttributes<FieldMark>> {
  declare id: CreationOptional<string>;
  declare eventId: ForeignKey<Event['id']>;
  declare matchId: ForeignKey<Match['id']>;
  declare startedAt: Date;
  declare markedById: ForeignKey<User['id']>;
  declare undoneAt: CreationOptional<Date | null>;
  declare undoneById: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    FieldMark.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        startedAt: { type: DataTypes.DATE(3), allowNull: false },
        undoneAt: { type: DataTypes.DATE(3), allowNull: true },
        undoneById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'field_marks' },
    );
  }

  /**
   * Start of each match of the event: the latest mark not undone (a second tap corrects the
   * first). Only matches with such a mark are in the map.
   */
  static async startsOf(eventId: string, { matchId, transaction }: { matchId?: string; transaction?: Transaction } = {}) {
    const marks = await FieldMark.findAll({
      where: { eventId, undoneAt: null, ...(matchId ? { matchId } : {}) },
      order: [['createdAt', 'ASC'], ['id', 'ASC']],
      transaction,
    });
    return new Map(marks.map((mark) => [mark.matchId, mark.startedAt]));
  }
}
