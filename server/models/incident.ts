import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
  type Transaction,
} from 'sequelize';
import type { IncidentClass, IncidentKind, IncidentLocation, TreatmentCode } from '../../shared/domain/incident-classification';
import type { AlertRuleKey } from '../../shared/schemas/mail';
import type { IncidentStatus, InvolvedPersonJson } from '../../shared/schemas/incidents';
import { notFound } from '../errors';
import type { Battery } from './battery';
import { jsonText } from './json-text';
import type { User } from './user';

/** A follow-up action as stored; the owner is a membership of the team. */
export interface StoredFollowUp {
  id: string;
  text: string;
  ownerId: string;
  dueOn: string;
  done: boolean;
  doneAt: string | null;
}

/** One entry of the safety log: what happened, to whom (initials and role only), the care given, what follows. */
export class Incident extends Model<InferAttributes<Incident>, InferCreationAttributes<Incident>> {
  declare id: CreationOptional<string>;
  declare teamId: string;
  declare eventId: string | null;
  declare occurredAt: Date;
  declare location: IncidentLocation;
  declare kind: IncidentKind;
  declare description: string;
  declare involved: InvolvedPersonJson[];
  declare treatments: TreatmentCode[];
  declare immediateActions: string | null;
  declare batteryId: string | null;
  declare incidentClass: IncidentClass;
  declare alertedRule: CreationOptional<AlertRuleKey | null>;
  declare followUps: CreationOptional<StoredFollowUp[]>;
  declare status: CreationOptional<IncidentStatus>;
  declare closingNote: CreationOptional<string | null>;
  declare closedAt: CreationOptional<Date | null>;
  declare closedById: CreationOptional<string | null>;
  declare reporterId: string;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare reporter?: NonAttribute<User>;
  declare battery?: NonAttribute<Battery>;

  /** The team's incident; 404 otherwise, never told apart from a missing one. `lock` holds its row for the transaction. */
  static async ofTeam(teamId: string, id: string, { transaction, lock = false }: { transaction?: Transaction; lock?: boolean } = {}) {
    const incident = await Incident.findOne({ where: { id, teamId }, transaction, ...(lock && transaction ? { lock: transaction.LOCK.UPDATE } : {}) });
    if (!incident) throw notFound('Incident');
    return incident;
  }

  static initModel(sequelize: Sequelize) {
    Incident.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        teamId: { type: DataTypes.UUID, allowNull: false },
        eventId: { type: DataTypes.UUID, allowNull: true },
        occurredAt: { type: DataTypes.DATE(3), allowNull: false },
        location: { type: DataTypes.STRING(16), allowNull: false },
        kind: { type: DataTypes.STRING(24), allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false },
        involved: jsonText<InvolvedPersonJson[]>('involved', []),
        treatments: jsonText<TreatmentCode[]>('treatments', []),
        immediateActions: { type: DataTypes.TEXT, allowNull: true },
        batteryId: { type: DataTypes.UUID, allowNull: true },
        incidentClass: { type: DataTypes.STRING(20), allowNull: false },
        alertedRule: { type: DataTypes.STRING(16), allowNull: true, defaultValue: null },
        followUps: { ...jsonText<StoredFollowUp[]>('followUps', []), defaultValue: '[]' },
        status: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'open' },
        closingNote: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
        closedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        closedById: { type: DataTypes.UUID, allowNull: true, defaultValue: null },
        reporterId: { type: DataTypes.UUID, allowNull: false },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'incidents', version: true },
    );
  }
}
