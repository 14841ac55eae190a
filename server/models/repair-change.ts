import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { RepairChangeKind } from '../../shared/schemas/repairs';

/** What one change did: field → [before, after]. */
export type ChangeSet = Record<string, [unknown, unknown]>;

/** A ticket's history: one row per kind of change of one write, who and when. Append-only. */
export class RepairChange extends Model<InferAttributes<RepairChange>, InferCreationAttributes<RepairChange>> {
  declare id: CreationOptional<string>;
  declare repairId: string;
  declare kind: RepairChangeKind;
  declare changes: ChangeSet;
  declare byId: string;
  declare at: Date;

  static initModel(sequelize: Sequelize) {
    RepairChange.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        repairId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        changes: {
          type: DataTypes.TEXT('medium'),
          allowNull: false,
          get(this: RepairChange) {
            const stored = this.getDataValue('changes') as unknown as string | undefined;
            // Undefined on a partial instance (a static update builds one from the fields it sets).
            return (stored === undefined ? {} : JSON.parse(stored)) as ChangeSet;
          },
          set(this: RepairChange, changes: ChangeSet) {
            this.setDataValue('changes', JSON.stringify(changes) as unknown as ChangeSet);
          },
        },
        byId: { type: DataTypes.UUID, allowNull: false },
        at: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'repair_changes', timestamps: false },
    );
  }
}
