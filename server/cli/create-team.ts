/**
 * `npm run create-team -- --number 24680 --name "Team name" --admin-email you@example.org
 * --admin-name "Your name"`: a team and its first admin on the database `npm start` uses
 * (which must be running). Prints the admin's temporary password once.
 */
import { parseArgs } from 'node:util';
import { z } from 'zod';
import { loadConfig } from '../config';
import { createTeam } from '../commands/create-team';
import { createSequelize } from '../db/sequelize';
import { initModels } from '../models';
import { emailField } from '../../shared/schemas/session';
import { fieldsOf } from '../middleware/error-handler';

const argsSchema = z.object({
  number: z.coerce.number({ message: 'A whole number' }).int({ message: 'A whole number' }).min(1, { message: 'From 1 to 99999' }).max(99999, { message: 'From 1 to 99999' }),
  name: z.string().trim().min(1, { message: 'Give the team a name' }).max(120),
  adminEmail: emailField,
  adminName: z.string().trim().min(1, { message: 'Give the admin a name' }).max(80),
});

const { values } = parseArgs({
  options: { number: { type: 'string' }, name: { type: 'string' }, 'admin-email': { type: 'string' }, 'admin-name': { type: 'string' } },
});
const parsed = argsSchema.safeParse({ number: values.number, name: values.name, adminEmail: values['admin-email'], adminName: values['admin-name'] });
if (!parsed.success) {
  for (const [field, message] of Object.entries(fieldsOf(parsed.error))) console.error(`--${field.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}: ${message}`);
  process.exit(2);
}

const config = loadConfig({ SESSION_SECRET: 'not-used-by-this-command', ...process.env });
const sequelize = createSequelize(config.databaseUrl);
initModels(sequelize);
try {
  const { team, admin, temporaryPassword } = await createTeam(parsed.data);
  console.log(`Team ${team.number} ${team.name} created; admin: ${admin.email}`);
  console.log(temporaryPassword ? `Temporary password (shown once): ${temporaryPassword}` : 'The admin signs in with their existing password.');
} finally {
  await sequelize.close();
}
