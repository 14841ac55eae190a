/**
 * `npm start` (and `npm run dev` with --dev): everything from a fresh machine to a running
 * board — dependencies, the private MariaDB, migrations, the demo seed, the client build and
 * the server — and a clean shutdown of all of it on Ctrl-C.
 */
import os from 'node:os';
import path from 'node:path';
import { startPrivateMariaDb } from './lib/mariadb.mjs';
import { ensureClientBuild } from './lib/client-build.mjs';
import { sessionSecret } from './lib/session-secret.mjs';
import { ensureDependencies } from './lib/dependencies.mjs';
import { fail, SetupError, step } from './lib/log.mjs';
import { portAnswers, run, serviceGroup, startService, waitFor } from './lib/processes.mjs';
import { ensureSmtpPortFree, startSmtpFakeService } from './lib/smtp-fake.mjs';

const dev = process.argv.includes('--dev');
const services = serviceGroup({ onStopping: () => step('Stopping…') });

async function main() {
  await ensureDependencies();

  const dataDir = path.resolve(process.env.DATA_DIR ?? './data');
  const port = Number(process.env.PORT ?? 5180);
  if (await portAnswers(port)) {
    throw new SetupError(`Port ${port} is already in use: is Pitwright already running? Stop it, or set PORT to a free port.`);
  }
  // Without a mail relay, e-mail goes to the local SMTP fake and the Mailbox page shows it.
  const smtpPort = process.env.SMTP_URL ? undefined : Number(process.env.SMTP_PORT ?? 2525);
  if (smtpPort) await ensureSmtpPortFree(smtpPort, 'SMTP_PORT');
  const env = { ...process.env, DATA_DIR: dataDir, PORT: String(port), SESSION_SECRET: sessionSecret(dataDir) };
  if (!process.env.DATABASE_URL) {
    const dbPort = Number(process.env.DB_PORT ?? 3307);
    const credentials = { database: env.DB_NAME ?? 'pitwright', user: env.DB_USER ?? 'pitwright', password: env.DB_PASSWORD ?? 'pitwright' };
    await startPrivateMariaDb({ dataDir, port: dbPort, ...credentials, track: services.add });
    env.DB_PORT = String(dbPort);
  } else {
    step('Using the database at DATABASE_URL (no private MariaDB started).');
  }
  if (services.stopping) return;

  step('Preparing the database (migrations, demo seed on first run)…');
  await run(process.execPath, ['--import', 'tsx', 'server/db/prepare.ts'], { env });
  if (!dev) await ensureClientBuild();
  if (services.stopping) return;

  if (smtpPort) {
    const fake = await startSmtpFakeService({ env, port: smtpPort, variable: 'SMTP_PORT', track: services.add });
    fake.exited.then(({ code }) => !services.stopping && (console.error(`The SMTP fake stopped (exit ${code}).`), services.stopAll(1)));
    env.SMTP_PORT = String(smtpPort);
  }

  const serverArgs = dev ? ['--watch-path=server', '--watch-path=shared', '--import', 'tsx', 'server/index.ts'] : ['--import', 'tsx', 'server/index.ts'];
  const server = services.add(startService(process.execPath, serverArgs, { env, ipc: true }));
  server.exited.then(({ code }) => !services.stopping && (console.error(`The server stopped (exit ${code}).`), services.stopAll(1)));
  await waitFor(() => fetch(`http://127.0.0.1:${port}/api/health`).then((r) => r.ok, () => false), { timeoutMs: 60_000, what: 'the server' });

  let url = `http://localhost:${port}`;
  if (dev) {
    services.add(startService(process.execPath, ['node_modules/vite/bin/vite.js', '--host', '--strictPort'], { env }));
    url = 'http://localhost:5173 (Vite, with hot reload)';
  }
  printWelcome(url, port, smtpPort);
}

function printWelcome(url, port, smtpPort) {
  const lan = Object.values(os.networkInterfaces())
    .flat()
    .filter((address) => address && address.family === 'IPv4' && !address.internal)
    .map((address) => `http://${address.address}:${port}`);
  console.log(`\n  Pitwright is running: ${url}`);
  if (lan.length) console.log(`  Tablets on the same network: ${lan.join('  ')}`);
  console.log(
    smtpPort
      ? `  E-mail stays on this machine: the SMTP fake on 127.0.0.1:${smtpPort} keeps it for the Mailbox page (mentors). Set SMTP_URL to send real mail.`
      : '  E-mail is sent through the mail server at SMTP_URL.',
  );
  if (process.env.NODE_ENV !== 'production') {
    console.log('\n  Demo sign-ins (password: pitwright-demo):');
    for (const role of ['admin', 'lead', 'crew', 'battery', 'safety', 'viewer']) console.log(`    ${role.padEnd(8)} ${role}@demo.pitwright.test`);
  }
  console.log(`\n  Ctrl-C stops the server${smtpPort ? ', the SMTP fake' : ''} and the database.\n`);
}

main().catch(async (error) => {
  fail(error);
  await services.stopAll(1);
});
