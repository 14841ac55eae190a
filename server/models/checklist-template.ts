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
import type { ChecklistPhase } from '../../shared/domain/checklist';
import { notFound } from '../errors';
import type { Team } from './team';

/**
 * A team's checklist. Its name, phase and items live in immutable versions; the row holds the
 * current version's number (`version`) and copies its name and phase for listing.
 */
export class ChecklistTemplate extends Model<InferAttributes<ChecklistTemplate>, InferCreationAttributes<ChecklistTemplate>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare name: string;
  declare phase: ChecklistPhase;
  declare version: number;
  declare createdById: string;
  declare updatedById: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /** The team's template, or 404: another team's is never told apart from a missing one. */
  static async ofTeam(teamId: string, id: string, { transaction, lock = false }: { transaction?: Transaction; lock?: boolean } = {}) {
    const template = await ChecklistTemplate.findOne({
      where: { id, teamId },
      transaction,
      ...(lock && transaction ? { lock: transaction.LOCK.UPDATE } : {}),
    });
    if (!template) throw notFound('Checklist template');
    return template;
  }

  static initModel(sequelize: Sequelize) {
    ChecklistTemplate.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(80), allowNull: false },
        phase: { type: DataTypes.STRING(16), allowNull: false },
        version: { type: DataTypes.INTEGER, allowNull: false },
        createdById: { type: DataTypes.UUID, allowNull: false },
        updatedById: { type: DataTypes.UUID, allowNull: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'checklist_templates' },
    );
  }
}
