import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { ChecklistItem, ChecklistPhase } from '../../shared/domain/checklist';
import type { ChecklistTemplate } from './checklist-template';

/** One version of a template, never changed once written: runs point at the version they began with. */
export class ChecklistTemplateVersion extends Model<
  InferAttributes<ChecklistTemplateVersion>,
  InferCreationAttributes<ChecklistTemplateVersion>
> {
  declare id: CreationOptional<string>;
  declare templateId: ForeignKey<ChecklistTemplate['id']>;
  declare number: number;
  declare name: string;
  declare phase: ChecklistPhase;
  declare items: ChecklistItem[];
  declare createdById: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ChecklistTemplateVersion.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        number: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        phase: { type: DataTypes.STRING(16), allowNull: false },
        // A JSON snapshot: the version is read and written whole, never queried by item.
        items: {
          type: DataTypes.TEXT('medium'),
          allowNull: false,
          get(this: ChecklistTemplateVersion) {
            return JSON.parse(this.getDataValue('items') as unknown as string) as ChecklistItem[];
          },
          set(this: ChecklistTemplateVersion, items: ChecklistItem[]) {
            this.setDataValue('items', JSON.stringify(items) as unknown as ChecklistItem[]);
          },
        },
        createdById: { type: DataTypes.UUID, allowNull: false },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'checklist_template_versions', updatedAt: false },
    );
  }
}
