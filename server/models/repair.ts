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
import type { RepairSeverity, RepairStatus } from '../../shared/domain/repair-urgency';
import { notFound } from '../errors';
import { Event } from './event';

/** A ticket of an event's repair board: what is broken, who is on it, and where it sits. */
export class Repair extends Model<InferAttributes<Repair>, InferCreationAttributes<Repair>> {
  declare id: CreationOptional<string>;
  declare eventId: ForeignKey<Event['id']>;
  declare title: string;
  declare description: string | null;
  declare subsystem: string;
  declare severity: RepairSeverity;
  declare status: RepairStatus;
  /** Fractional key (fractional-indexing): the column sorted by it, then id, is in board order. */
  declare orderKey: string;
  declare placedByHand: CreationOptional<boolean>;
  declare foundInMatchId: string | null;
  declare reporterId: string;
  declare assigneeId: string | null;
  declare estimateMinutes: number | null;
  declare timeSpentMinutes: CreationOptional<number>;
  declare partsUsed: string[];
  declare resolutionNote: CreationOptional<string | null>;
  declare doneAt: CreationOptional<Date | null>;
  declare version: CreationOptional<number>;
  /** When it was reported. */
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /**
   * The ticket, when its event is the team's; 404 otherwise, never told apart from a missing one.
   * With `lock`, the ticket's row is read as it is now and held for the transaction.
   */
  static async ofTeam(teamId: string, id: string, { transaction, lock = false }: { transaction?: Transaction; lock?: boolean } = {}) {
    const repair = await Repair.findByPk(id, { transaction, ...(lock && transaction ? { lock: transaction.LOCK.UPDATE } : {}) });
    const event = repair && (await Event.findOne({ where: { id: repair.eventId, teamId }, attributes: ['id'], transaction }));
    if (!repair || !event) throw notFound('Repair');
    return repair;
  }

  static initModel(sequelize: Sequelize) {
    Repair.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        title: { type: DataTypes.STRING(120), allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: true },
        subsystem: { type: DataTypes.STRING(40), allowNull: false },
        severity: { type: DataTypes.STRING(16), allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false },
        orderKey: { type: DataTypes.STRING(64), allowNull: false },
        placedByHand: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        foundInMatchId: { type: DataTypes.UUID, allowNull: true },
        reporterId: { type: DataTypes.UUID, allowNull: false },
        assigneeId: { type: DataTypes.UUID, allowNull: true },
        estimateMinutes: { type: DataTypes.INTEGER, allowNull: true },
        timeSpentMinutes: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        partsUsed: {
          type: DataTypes.TEXT,
          allowNull: false,
          get(this: Repair) {
            const stored = this.getDataValue('partsUsed') as unknown as string | undefined;
            // Undefined on a partial instance (a static update builds one from the fields it sets).
            return (stored === undefined ? [] : JSON.parse(stored)) as string[];
          },
          set(this: Repair, lines: string[]) {
            this.setDataValue('partsUsed', JSON.stringify(lines) as unknown as string[]);
          },
        },
        resolutionNote: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
        doneAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'repairs', version: true },
    );
  }
}
