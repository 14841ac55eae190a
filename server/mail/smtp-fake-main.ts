/**
 * The local SMTP fake as a service (`npm start` and `npm test` run it when SMTP_URL is unset):
 * every message it receives is kept in mail_messages, where the Mailbox page reads it.
 */
import { loadConfig } from '../config';
import { createSequelize } from '../db/sequelize';
import { CapturedMail, initModels } from '../models';
import { startSmtpFake, type ReceivedMail } from './smtp-fake';

// The fake reads the database and its port only.
const config = loadConfig({ SESSION_SECRET: 'not-used-by-the-smtp-fake', ...process.env });
const sequelize = createSequelize(config.databaseUrl);
initModels(sequelize);

const clip = (value: string, length: number) => (value.length > length ? `${value.slice(0, length - 1)}…` : value);

const store = async (mail: ReceivedMail) => {
  await CapturedMail.create({
    teamId: mail.teamId,
    fromAddress: clip(mail.from, 254),
    toAddresses: clip(mail.to.join(', '), 2000),
    subject: clip(mail.subject, 500),
    text: mail.text,
    receivedAt: mail.receivedAt,
  });
};

try {
  const fake = await startSmtpFake({ host: '127.0.0.1', port: config.mail.fakePort, store });
  console.log(`SMTP fake listening on 127.0.0.1:${fake.port}: mail is kept for the Mailbox page, none leaves this machine.`);
  let stopping = false;
  const shutdown = () => {
    if (stopping) return;
    stopping = true;
    void fake.close().finally(() => sequelize.close().finally(() => process.exit(0)));
  };
  process.on('SIGTERM', shutdown);
  process.on('SIGINT', shutdown);
  // Started by `npm start` or `npm test`: when that process is gone, so is the reason to run.
  process.on('disconnect', shutdown);
} catch (error) {
  const code = (error as NodeJS.ErrnoException).code;
  console.error(
    code === 'EADDRINUSE'
      ? `Port ${config.mail.fakePort} is already in use, so the SMTP fake cannot start. Stop what uses it, or set SMTP_PORT to a free port.`
      : `The SMTP fake could not start: ${(error as Error).message}`,
  );
  await sequelize.close();
  process.exit(1);
}
