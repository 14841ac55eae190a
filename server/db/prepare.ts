/**
 * Brings a database up to date: runs pending migrations, then seeds the demo when the database
 * holds no team yet (never in production). Run by `npm start`, `npm run dev` and `npm test`.
 */
import { ConnectionError } from 'sequelize';
import { loadConfig } from '../config';
import { initModels, Team } from '../models';
import { createMigrator } from './migrate';
import { seedDemo } from './seed/demo';
import { createSequelize } from './sequelize';

const config = loadConfig({ SESSION_SECRET: 'not-used-while-preparing', ...process.env });
const sequelize = createSequelize(config.databaseUrl);
initModels(sequelize);
const seed = !process.argv.includes('--no-seed');

try {
  const applied = await createMigrator(sequelize).up();
  console.log(applied.length ? `Applied ${applied.length} migration(s).` : 'Database schema is up to date.');
  if (seed && (await Team.count()) === 0) {
    if (config.env === 'production') {
      console.log('Empty database, and no demo in production: create your team with `npm run create-team` (see README).');
    } else {
      await seedDemo({ env: config.env });
      console.log('Seeded the demo team.');
    }
  }
} catch (error) {
  // A database that cannot be reached is a set-up problem: one line, not a stack trace.
  if (!(error instanceof ConnectionError)) throw error;
  console.error(`Cannot reach the database (${error.message}). Check DATABASE_URL or DB_PORT.`);
  process.exitCode = 1;
} finally {
  await sequelize.close();
}
