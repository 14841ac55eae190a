import { spawn } from 'node:child_process';
import net from 'node:net';
import { SetupError } from './log.mjs';

/** Runs a command to completion with inherited output; rejects on a non-zero exit. */
export function run(command, args, { env = process.env, quiet = false } = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { env, stdio: quiet ? ['ignore', 'pipe', 'pipe'] : 'inherit' });
    let output = '';
    child.stdout?.on('data', (chunk) => (output += chunk));
    child.stderr?.on('data', (chunk) => (output += chunk));
    child.on('error', reject);
    child.on('exit', (code, signal) =>
      code === 0 ? resolve(output) : reject(new SetupError(`${command} ${args.join(' ')} failed (${signal ?? `exit ${code}`})\n${output.slice(-2000)}`)),
    );
  });
}

/**
 * Starts a long-running child in its own process group, so that Ctrl-C in the terminal reaches
 * only us and we stop the children in order, and so that stopping it also stops its children.
 */
export function startService(command, args, { env = process.env, stdio = 'inherit', ipc = false, timeoutMs = 10_000 } = {}) {
  const streams = typeof stdio === 'string' ? [stdio, stdio, stdio] : stdio;
  // An IPC channel closes when we die, even by SIGKILL: a child that listens for it never outlives us.
  const child = spawn(command, args, { env, stdio: ipc ? [...streams, 'ipc'] : streams, detached: true });
  const exited = new Promise((resolve) => {
    child.on('exit', (code, signal) => resolve({ code, signal }));
    child.on('error', (error) => resolve({ code: null, signal: null, error }));
  });
  return {
    child,
    exited,
    async stop() {
      if (child.pid === undefined || child.exitCode !== null || child.signalCode !== null) return;
      signalGroup(child.pid, 'SIGTERM');
      const timer = setTimeout(() => signalGroup(child.pid, 'SIGKILL'), timeoutMs);
      await exited;
      clearTimeout(timer);
    },
  };
}

function signalGroup(pid, signal) {
  try {
    process.kill(-pid, signal);
  } catch {
    // already gone
  }
}

/** True when something on this machine already accepts connections on the port. */
export const portAnswers = (port, host = '127.0.0.1') =>
  new Promise((resolve) => {
    const socket = net.connect({ host, port });
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
  });

export function isAlive(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return error.code === 'EPERM';
  }
}

export async function waitFor(check, { timeoutMs, intervalMs = 200, what }) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    if (await check()) return;
    if (Date.now() > deadline) throw new SetupError(`Timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, intervalMs));
  }
}

/**
 * The services one script started, stopped in reverse order (the server before the database)
 * on Ctrl-C, on TERM, or when the script is done. `stopAll` exits the process.
 */
export function serviceGroup({ onStopping = () => {} } = {}) {
  const services = [];
  let stopping = false;
  async function stopAll(exitCode) {
    if (stopping) return;
    stopping = true;
    onStopping();
    for (const service of services.reverse()) await service.stop();
    process.exit(exitCode);
  }
  process.on('SIGINT', () => stopAll(130));
  process.on('SIGTERM', () => stopAll(143));
  return {
    add(service) {
      services.push(service);
      return service;
    },
    stopAll,
    get stopping() {
      return stopping;
    },
  };
}
