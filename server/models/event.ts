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
import { TIMELINE_DEFAULTS } from '../../shared/domain/timeline';
import type { Team } from './team';

/** A competition weekend; dates are the venue's calendar days, instants elsewhere are UTC. */
export class Event extends Model<InferAttributes<Event>, InferCreationAttributes<Event>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare name: string;
  declare venue: string;
  declare timeZone: string;
  declare startDate: string;
  declare endDate: string;
  declare teamNumber: number;
  // Timeline settings; exactly one of the two queue leads is set (a CHECK in the database).
  declare queueLeadMatches: CreationOptional<number | null>;
  declare queueLeadMinutes: CreationOptional<number | null>;
  declare matchLengthSeconds: CreationOptional<number>;
  declare returnToPitMinutes: CreationOptional<number>;
  declare tightTurnaroundMinutes: CreationOptional<number>;
  declare allowRunningAhead: CreationOptional<boolean>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /**
   * The team's event, or 404 "Event not found": another team's event is never told apart from
   * a missing one. With `lock`, schedule writes of one event queue behind each other.
   */
  static async ofTeam(teamId: string, eventId: string, { transaction, lock = false }: { transaction?: Transaction; lock?: boolean } = {}) {
    const event = await Event.findOne({ where: { id: eventId, teamId }, transaction, ...(lock && transaction ? { lock: transaction.LOCK.UPDATE } : {}) });
    if (!event) throw notFound('Event');
    return event;
  }

  static initModel(sequelize: Sequelize) {
    Event.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        venue: { type: DataTypes.STRING(160), allowNull: false },
        timeZone: { type: DataTypes.STRING(64), allowNull: false },
        startDate: { type: DataTypes.DATEONLY, allowNull: false },
        endDate: { type: DataTypes.DATEONLY, allowNull: false },
        teamNumber: { type: DataTypes.INTEGER, allowNull: false },
        // Defaults repeated from the migration so that a created instance answers them at once.
        queueLeadMatches: { type: DataTypes.INTEGER, allowNull: true, defaultValue: TIMELINE_DEFAULTS.queueLead.matches },
        queueLeadMinutes: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
        matchLengthSeconds: { type: DataTypes.INTEGER, allowNull: false, defaultValue: TIMELINE_DEFAULTS.matchLengthSeconds },
        returnToPitMinutes: { type: DataTypes.INTEGER, allowNull: false, defaultValue: TIMELINE_DEFAULTS.returnToPitMinutes },
        tightTurnaroundMinutes: { type: DataTypes.INTEGER, allowNull: false, defaultValue: TIMELINE_DEFAULTS.tightTurnaroundMinutes },
        allowRunningAhead: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: TIMELINE_DEFAULTS.allowRunningAhead },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'events', version: true },
    );
  }
}
