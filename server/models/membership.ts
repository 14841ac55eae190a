import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import { ROLES, type Role } from '../../shared/roles';
import type { Team } from './team';
import type { User } from './user';

export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare userId: ForeignKey<User['id']>;
  declare roles: Role[];
  declare active: CreationOptional<boolean>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare team?: NonAttribute<Team>;
  declare user?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Membership.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        // Stored as a comma list; roles unknown to this version of the code are dropped on read.
        roles: {
          type: DataTypes.STRING(120),
          allowNull: false,
          get(this: Membership) {
            const stored = this.getDataValue('roles') as unknown as string;
            return stored.split(',').filter((role): role is Role => (ROLES as readonly string[]).includes(role));
          },
          set(this: Membership, roles: Role[]) {
            this.setDataValue('roles', roles.join(',') as unknown as Role[]);
          },
        },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'memberships', version: true },
    );
  }
}
