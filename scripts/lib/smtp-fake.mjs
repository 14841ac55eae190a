import { SetupError } from './log.mjs';
import { portAnswers, startService, waitFor } from './processes.mjs';

/** Fails early, before anything else starts, when the fake's port is taken. */
export async function ensureSmtpPortFree(port, variable) {
  if (await portAnswers(port)) {
    throw new SetupError(`Port ${port} is already in use, so the local SMTP fake cannot start. Stop what uses it, or set ${variable} to a free port.`);
  }
}

/**
 * Starts the local SMTP fake (server/mail/smtp-fake-main.ts) on the loopback and waits until it
 * accepts connections. It stores what it receives in the database, so it runs after migrations.
 */
export async function startSmtpFakeService({ env, port, variable, track }) {
  await ensureSmtpPortFree(port, variable);
  const fake = track(
    startService(process.execPath, ['--import', 'tsx', 'server/mail/smtp-fake-main.ts'], { env: { ...env, SMTP_PORT: String(port) }, ipc: true }),
  );
  await waitFor(
    async () => {
      if (fake.child.exitCode !== null || fake.child.signalCode !== null) throw new SetupError('The SMTP fake stopped while starting (see above).');
      return portAnswers(port);
    },
    { timeoutMs: 30_000, what: 'the SMTP fake' },
  );
  return fake;
}
