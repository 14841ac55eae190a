import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Role } from '../../shared/roles';
import type { AlertRuleKey } from '../../shared/schemas/mail';
import { jsonText } from './json-text';

/** A team's setting for one alert rule; without a row the rule has its defaults (DEFAULT_ALERT_ROLES). */
export class AlertRule extends Model<InferAttributes<AlertRule>, InferCreationAttributes<AlertRule>> {
  declare teamId: string;
  declare key: AlertRuleKey;
  declare roles: Role[];
  declare extraAddresses: string[];
  declare version: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AlertRule.init(
      {
        teamId: { type: DataTypes.UUID, primaryKey: true },
        key: { type: DataTypes.STRING(16), primaryKey: true },
        roles: jsonText<Role[]>('roles', []),
        extraAddresses: jsonText<string[]>('extraAddresses', []),
        version: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'alert_rules' },
    );
  }
}
