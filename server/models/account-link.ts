import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Role } from '../../shared/roles';
import { jsonText } from './json-text';

export type AccountLinkPurpose = 'invite' | 'reset';

/**
 * A one-time link sent by e-mail: an invite to join a team, or a password reset. Only the
 * token's SHA-256 is stored; the link is used once, before `expiresAt`.
 */
export class AccountLink extends Model<InferAttributes<AccountLink>, InferCreationAttributes<AccountLink>> {
  declare id: CreationOptional<string>;
  declare purpose: AccountLinkPurpose;
  declare tokenHash: string;
  declare email: string;
  declare userId: string | null;
  declare teamId: string | null;
  declare name: string | null;
  declare roles: Role[] | null;
  declare createdById: string | null;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AccountLink.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        purpose: { type: DataTypes.STRING(8), allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
        email: { type: DataTypes.STRING(254), allowNull: false },
        userId: { type: DataTypes.UUID, allowNull: true },
        teamId: { type: DataTypes.UUID, allowNull: true },
        name: { type: DataTypes.STRING(80), allowNull: true },
        roles: jsonText<Role[] | null>('roles', null, { allowNull: true }),
        createdById: { type: DataTypes.UUID, allowNull: true },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        usedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        revokedAt: { type: DataTypes.DATE(3), allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'account_links', updatedAt: false },
    );
  }
}
