import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { SubsystemJson } from '../../shared/schemas/repairs';

/** A team's repair settings (its subsystem list), one row once a lead edits it; defaults until then. */
export class RepairSetting extends Model<InferAttributes<RepairSetting>, InferCreationAttributes<RepairSetting>> {
  declare teamId: string;
  declare subsystems: SubsystemJson[];
  /** Optimistic-locking token, counted by hand: 0 is the defaults, the first edit writes 1. */
  declare version: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    RepairSetting.init(
      {
        teamId: { type: DataTypes.UUID, primaryKey: true },
        subsystems: {
          type: DataTypes.TEXT,
          allowNull: false,
          get(this: RepairSetting) {
            const stored = this.getDataValue('subsystems') as unknown as string | undefined;
            // Undefined on a partial instance (a static update builds one from the fields it sets).
            return (stored === undefined ? [] : JSON.parse(stored)) as SubsystemJson[];
          },
          set(this: RepairSetting, subsystems: SubsystemJson[]) {
            this.setDataValue('subsystems', JSON.stringify(subsystems) as unknown as SubsystemJson[]);
          },
        },
        version: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'repair_settings' },
    );
  }
}
