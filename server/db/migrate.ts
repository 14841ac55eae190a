import { Umzug, SequelizeStorage, type MigrationParams } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import * as foundation from './migrations/20261201-0001-foundation';
import * as schedule from './migrations/20261202-0001-schedule';
import * as screenTokens from './migrations/20261202-0002-screen-tokens';
import * as checklists from './migrations/20261203-0001-checklists';
import * as batteries from './migrations/20261204-0001-batteries';
import * as repairs from './migrations/20261205-0001-repairs';
import * as safetyAndMail from './migrations/20261206-0001-safety-and-mail';

// Listed by hand, in order: a glob would change meaning with the build layout.
const MIGRATIONS = [
  { name: '20261201-0001-foundation', ...foundation },
  { name: '20261202-0001-schedule', ...schedule },
  { name: '20261202-0002-screen-tokens', ...screenTokens },
  { name: '20261203-0001-checklists', ...checklists },
  { name: '20261204-0001-batteries', ...batteries },
  { name: '20261205-0001-repairs', ...repairs },
  { name: '20261206-0001-safety-and-mail', ...safetyAndMail },
];

/** The migrator for one database; `up()` applies what is missing, `down()` steps back. */
export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: MIGRATIONS.map(({ name, up, down }) => ({
      name,
      up: ({ context }: MigrationParams<QueryInterface>) => up({ context }),
      down: ({ context }: MigrationParams<QueryInterface>) => down({ context }),
    })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}
