import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** express-session's rows; `userId` lets a deactivation end every session of one member. */
export class SessionRecord extends Model<InferAttributes<SessionRecord>, InferCreationAttributes<SessionRecord>> {
  declare sid: string;
  declare userId: string | null;
  declare expires: Date | null;
  declare data: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SessionRecord.init(
      {
        sid: { type: DataTypes.STRING(36), primaryKey: true },
        userId: { type: DataTypes.UUID, allowNull: true },
        expires: DataTypes.DATE(3),
        data: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'sessions' },
    );
  }
}
