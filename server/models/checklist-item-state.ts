import {
  DataTypes,
  Model,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { MarkValue } from '../../shared/domain/checklist';

/** A mark's value as stored: JSON text, so that a tick, a number and a text keep their type. */
export const encodeMarkValue = (value: MarkValue | null): string | null => (value === null ? null : JSON.stringify(value));
export const decodeMarkValue = (stored: string | null): MarkValue | null => (stored === null ? null : (JSON.parse(stored) as MarkValue));

/**
 * The current mark of one item of a run (value null: not marked). Every item of a run has its
 * row from the run's start, so marking is an UPDATE by primary key: tablets marking different
 * items never wait for each other, and the last of two marks of one item wins whole.
 */
export class ChecklistItemState extends Model<InferAttributes<ChecklistItemState>, InferCreationAttributes<ChecklistItemState>> {
  declare runId: string;
  declare itemId: string;
  /** JSON text; read it with decodeMarkValue. */
  declare value: string | null;
  declare note: string | null;
  declare markedById: string | null;
  declare markedAt: Date | null;

  static initModel(sequelize: Sequelize) {
    ChecklistItemState.init(
      {
        runId: { type: DataTypes.UUID, primaryKey: true },
        itemId: { type: DataTypes.STRING(40), primaryKey: true },
        value: { type: DataTypes.TEXT, allowNull: true },
        note: { type: DataTypes.STRING(200), allowNull: true },
        markedById: { type: DataTypes.UUID, allowNull: true },
        markedAt: { type: DataTypes.DATE(3), allowNull: true },
      },
      { sequelize, tableName: 'checklist_item_states', timestamps: false },
    );
  }
}
