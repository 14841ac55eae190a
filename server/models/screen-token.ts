import { createHash, randomBytes } from 'node:crypto';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Team } from './team';

/** sha256 hex of a screen token: what the table keeps and what a lookup compares. */
export const hashScreenToken = (token: string) => createHash('sha256').update(token, 'utf8').digest('hex');

/** A fresh screen token: 32 random bytes, base64url (43 characters, safe in a path). */
export const newScreenToken = () => randomBytes(32).toString('base64url');

/** A pit screen's access: a TV reads the board with the token, until an admin revokes it. */
export class ScreenToken extends Model<InferAttributes<ScreenToken>, InferCreationAttributes<ScreenToken>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare name: string;
  declare tokenHash: string;
  declare createdById: string;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /** The unrevoked screen a token opens, or null (unknown, malformed or revoked alike). */
  static async active(token: string) {
    // A real token is 43 base64url characters; anything else cannot match, so skip the query.
    if (!/^[A-Za-z0-9_-]{43}$/.test(token)) return null;
    return ScreenToken.findOne({ where: { tokenHash: hashScreenToken(token), revokedAt: null } });
  }

  static initModel(sequelize: Sequelize) {
    ScreenToken.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(60), allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
        createdById: { type: DataTypes.UUID, allowNull: false },
        revokedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'screen_tokens' },
    );
  }
}
