import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { MailKind } from '../../shared/schemas/mail';

export type OutboxStatus = 'pending' | 'sent' | 'failed';

/**
 * One e-mail to one address, written in the transaction of the change that causes it and sent
 * after the commit, with retries: a change is never held up or undone by the mail server.
 */
export class OutboxMail extends Model<InferAttributes<OutboxMail>, InferCreationAttributes<OutboxMail>> {
  declare id: CreationOptional<string>;
  declare teamId: string | null;
  declare kind: MailKind;
  declare incidentId: CreationOptional<string | null>;
  declare toAddress: string;
  declare subject: string;
  declare text: string;
  declare status: CreationOptional<OutboxStatus>;
  declare attempts: CreationOptional<number>;
  declare lastError: CreationOptional<string | null>;
  declare nextAttemptAt: Date;
  declare claimedUntil: Date | null;
  declare sentAt: CreationOptional<Date | null>;
  declare failedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    OutboxMail.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        teamId: { type: DataTypes.UUID, allowNull: true },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        incidentId: { type: DataTypes.UUID, allowNull: true, defaultValue: null },
        toAddress: { type: DataTypes.STRING(254), allowNull: false },
        subject: { type: DataTypes.STRING(300), allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        status: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'pending' },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastError: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
        nextAttemptAt: { type: DataTypes.DATE(3), allowNull: false },
        claimedUntil: { type: DataTypes.DATE(3), allowNull: true },
        sentAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        failedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'mail_outbox' },
    );
  }
}
