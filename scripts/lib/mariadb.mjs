import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { isAlive, portAnswers, run, startService, waitFor } from './processes.mjs';
import { SetupError, step, warn } from './log.mjs';
import { ensureDebianPackage } from './system-packages.mjs';

// A Unix socket path must stay under ~107 bytes; deep checkouts get one in the temp folder.
function socketPathFor(dir) {
  const inDir = path.join(dir, 'mysqld.sock');
  if (inDir.length < 100) return inDir;
  return path.join(os.tmpdir(), `pitwright-${crypto.createHash('sha1').update(dir).digest('hex').slice(0, 12)}.sock`);
}

const readPid = (file) => (fs.existsSync(file) ? Number.parseInt(fs.readFileSync(file, 'utf8'), 10) : NaN);
const commandLineOf = (pid) => {
  try {
    return fs.readFileSync(`/proc/${pid}/cmdline`, 'utf8').split('\0').join(' ');
  } catch {
    return '';
  }
};

/** Stops a server left running by a run that crashed, or clears its stale pid file. */
async function clearLeftovers(dir, pidFile) {
  const pid = readPid(pidFile);
  if (Number.isNaN(pid)) return;
  if (isAlive(pid) && commandLineOf(pid).includes(dir)) {
    warn(`A database from an earlier run is still running (pid ${pid}); stopping it cleanly to start afresh.`);
    process.kill(pid, 'SIGTERM');
    await waitFor(() => !isAlive(pid), { timeoutMs: 60_000, what: `the old database (pid ${pid}) to stop` });
  } else {
    warn('Removing a stale database pid file left by a run that crashed.');
  }
  fs.rmSync(pidFile, { force: true });
}

/**
 * Starts a private MariaDB server with its data under `dataDir`, listening only on
 * 127.0.0.1:`port`; makes the database and its user. `track` receives the server's handle as
 * soon as it is spawned, so that a Ctrl-C while it starts stops it too; `stop()` on the handle
 * shuts it down cleanly.
 */
export async function startPrivateMariaDb({ dataDir, port, database, user, password, fresh = false, track }) {
  const why = 'the private database';
  const mariadbd = await ensureDebianPackage({ binary: 'mariadbd', pkg: 'mariadb-server', why });
  const installDb = await ensureDebianPackage({ binary: 'mariadb-install-db', pkg: 'mariadb-server', why });
  const dir = path.resolve(dataDir, 'mariadb');
  const pidFile = path.join(dir, 'mysqld.pid');
  const socketPath = socketPathFor(dir);
  fs.mkdirSync(dir, { recursive: true });
  await clearLeftovers(dir, pidFile);
  if (await portAnswers(port)) {
    throw new SetupError(`Port ${port} on 127.0.0.1 is already used by another program. Set DB_PORT to a free port, or stop that program.`);
  }
  const asRoot = process.getuid?.() === 0 ? ['--user=root'] : [];
  if (!fs.existsSync(path.join(dir, 'mysql'))) {
    step(`Creating a private MariaDB data directory in ${path.relative(process.cwd(), dir) || dir}…`);
    await run(installDb, ['--no-defaults', `--datadir=${dir}`, ...asRoot, '--auth-root-authentication-method=normal', '--skip-test-db'], { quiet: true });
  }
  step(`Starting MariaDB on 127.0.0.1:${port}…`);
  const errorLog = path.join(dir, 'mariadb.err');
  const service = startService(
    mariadbd,
    ['--no-defaults', `--datadir=${dir}`, `--socket=${socketPath}`, `--port=${port}`, '--bind-address=127.0.0.1', ...asRoot, `--pid-file=${pidFile}`, `--log-error=${errorLog}`, '--character-set-server=utf8mb4', '--collation-server=utf8mb4_unicode_ci', '--skip-name-resolve', '--innodb-buffer-pool-size=128M'],
    // No inherited output: a background server must not hold the terminal's (or CI's) pipes open.
    { stdio: 'ignore', timeoutMs: 60_000 },
  );
  track(service);
  let exited = false;
  service.exited.then(() => (exited = true));
  try {
    await waitFor(async () => {
      if (exited) throw new SetupError(`MariaDB stopped while starting. Its log (${errorLog}) ends with:\n${tail(errorLog)}`);
      return portAnswers(port);
    }, { timeoutMs: 60_000, what: 'MariaDB to accept connections' });
    await provision({ socketPath, rootPasswordFile: path.resolve(dataDir, 'mariadb-root-password'), database, user, password, fresh });
  } catch (error) {
    await service.stop();
    throw error;
  }
}

function tail(file) {
  return fs.existsSync(file) ? fs.readFileSync(file, 'utf8').split('\n').slice(-15).join('\n') : '(no log)';
}

/**
 * A fresh data directory lets root in without a password, over TCP too. The first start gives
 * root a random password, kept readable only by us, and removes root's TCP accounts.
 */
async function secureRoot(connection, rootPasswordFile) {
  const rootPassword = crypto.randomBytes(24).toString('base64url');
  fs.writeFileSync(rootPasswordFile, rootPassword, { mode: 0o600 });
  for (const host of ['127.0.0.1', '::1', os.hostname()]) {
    await connection.query(`DROP USER IF EXISTS 'root'@${connection.escape(host)}, ''@${connection.escape(host)}`);
  }
  await connection.query(`DROP USER IF EXISTS ''@'localhost'`);
  await connection.query(`ALTER USER 'root'@'localhost' IDENTIFIED BY ${connection.escape(rootPassword)}`);
}

async function provision({ socketPath, rootPasswordFile, database, user, password, fresh }) {
  const mariadb = await import('mariadb');
  const secured = fs.existsSync(rootPasswordFile);
  const connection = await mariadb
    .createConnection({ socketPath, user: 'root', password: secured ? fs.readFileSync(rootPasswordFile, 'utf8').trim() : '' })
    .catch((error) => {
      throw new SetupError(
        `Could not sign in to the private MariaDB as root (${error.message}). The password lives in ${rootPasswordFile}; ` +
          `if that file was lost, remove ${path.dirname(socketPath)} to start from an empty database.`,
      );
    });
  try {
    if (!secured) await secureRoot(connection, rootPasswordFile);
    const db = connection.escapeId(database);
    if (fresh) await connection.query(`DROP DATABASE IF EXISTS ${db}`);
    await connection.query(`CREATE DATABASE IF NOT EXISTS ${db} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
    // Names are not resolved: '127.0.0.1' is TCP on loopback, 'localhost' the Unix socket.
    for (const host of ['localhost', '127.0.0.1']) {
      const account = `${connection.escape(user)}@${connection.escape(host)}`;
      await connection.query(`CREATE USER IF NOT EXISTS ${account} IDENTIFIED BY ${connection.escape(password)}`);
      await connection.query(`ALTER USER ${account} IDENTIFIED BY ${connection.escape(password)}`);
      await connection.query(`GRANT ALL PRIVILEGES ON ${db}.* TO ${account}`);
    }
  } finally {
    await connection.end();
  }
}
