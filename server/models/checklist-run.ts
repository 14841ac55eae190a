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
import { notFound } from '../errors';
import type { ChecklistTemplate } from './checklist-template';
import type { ChecklistTemplateVersion } from './checklist-template-version';
import { Event } from './event';

/** One pass through a template version, for an event and optionally one of our matches. */
export class ChecklistRun extends Model<InferAttributes<ChecklistRun>, InferCreationAttributes<ChecklistRun>> {
  declare id: CreationOptional<string>;
  declare eventId: ForeignKey<Event['id']>;
  declare templateId: ForeignKey<ChecklistTemplate['id']>;
  declare templateVersionId: ForeignKey<ChecklistTemplateVersion['id']>;
  declare matchId: string | null;
  declare createdById: string;
  declare signedOffAt: CreationOptional<Date | null>;
  declare signedOffById: CreationOptional<string | null>;
  declare signOffReason: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /** The run, when its event is the team's; else 404 (another team's run is never told apart). */
  static async ofTeam(teamId: string, id: string, { transaction, lock = false }: { transaction?: Transaction; lock?: boolean } = {}) {
    // Two reads rather than a join: MariaDB's FOR UPDATE would lock the event's row too, and the
    // event's row is what schedule writes queue behind.
    const run = await ChecklistRun.findByPk(id, { transaction, ...(lock && transaction ? { lock: transaction.LOCK.UPDATE } : {}) });
    if (!run || (await Event.count({ where: { id: run.eventId, teamId }, transaction })) === 0) throw notFound('Checklist run');
    return run;
  }

  static initModel(sequelize: Sequelize) {
    ChecklistRun.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        matchId: { type: DataTypes.UUID, allowNull: true },
        createdById: { type: DataTypes.UUID, allowNull: false },
        signedOffAt: { type: DataTypes.DATE(3), allowNull: true },
        signedOffById: { type: DataTypes.UUID, allowNull: true },
        signOffReason: { type: DataTypes.STRING(500), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'checklist_runs' },
    );
  }
}
