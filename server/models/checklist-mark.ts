import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** The history of a run's items: every mark and un-mark (value null), who and when. Append-only. */
export class ChecklistMark extends Model<InferAttributes<ChecklistMark>, InferCreationAttributes<ChecklistMark>> {
  declare id: CreationOptional<string>;
  declare runId: string;
  declare itemId: string;
  /** JSON text as in ChecklistItemState; null records an un-mark. */
  declare value: string | null;
  declare note: string | null;
  declare markedById: string;
  declare markedAt: Date;

  static initModel(sequelize: Sequelize) {
    ChecklistMark.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        runId: { type: DataTypes.UUID, allowNull: false },
        itemId: { type: DataTypes.STRING(40), allowNull: false },
        value: { type: DataTypes.TEXT, allowNull: true },
        note: { type: DataTypes.STRING(200), allowNull: true },
        markedById: { type: DataTypes.UUID, allowNull: false },
        markedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'checklist_marks', timestamps: false },
    );
  }
}
