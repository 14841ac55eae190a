import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A message the local SMTP fake received: what the Mailbox page shows. */
export class CapturedMail extends Model<InferAttributes<CapturedMail>, InferCreationAttributes<CapturedMail>> {
  declare id: CreationOptional<string>;
  /** From the message's X-Pitwright-Team header; null for mail that did not come from Pitwright. */
  declare teamId: string | null;
  declare fromAddress: string;
  declare toAddresses: string;
  declare subject: string;
  declare text: string;
  declare receivedAt: Date;

  static initModel(sequelize: Sequelize) {
    CapturedMail.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        teamId: { type: DataTypes.UUID, allowNull: true },
        fromAddress: { type: DataTypes.STRING(254), allowNull: false },
        toAddresses: { type: DataTypes.STRING(2000), allowNull: false },
        subject: { type: DataTypes.STRING(500), allowNull: false },
        text: { type: DataTypes.TEXT('medium'), allowNull: false },
        receivedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'mail_messages', timestamps: false },
    );
  }
}
