import net from 'node:net';
import { Op } from 'sequelize';
import { CapturedMail, OutboxMail } from '../../server/models';
import type { OutboxStatus } from '../../server/models/outbox-mail';
import { testApp } from './app';

// Generous: a wait that ends early passes at once; this only bounds a test that would hang.
const WAIT_MS = 20_000;
const POLL_MS = 50;

async function poll<T>(look: () => Promise<T | undefined>, what: string, timeoutMs = WAIT_MS): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = await look();
    if (found !== undefined) return found;
    if (Date.now() > deadline) throw new Error(`Waited ${timeoutMs} ms for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, POLL_MS));
  }
}

const addressedTo = (mail: CapturedMail, address: string) =>
  mail.toAddresses
    .split(',')
    .map((to) => to.trim().toLowerCase())
    .includes(address.toLowerCase());

/** Every message the SMTP fake has stored for the address so far, oldest first. */
export async function mailTo(address: string) {
  const candidates = await CapturedMail.findAll({ where: { toAddresses: { [Op.like]: `%${address}%` } }, order: [['receivedAt', 'ASC']] });
  return candidates.filter((mail) => addressedTo(mail, address));
}

/**
 * Waits until the SMTP fake has stored `count` messages for the address (the API tests run the
 * real fake: `npm test` starts it on SMTP_PORT) and returns them, oldest first.
 */
export async function waitForMailTo(address: string, { count = 1, timeoutMs }: { count?: number; timeoutMs?: number } = {}) {
  return poll(
    async () => {
      const mails = await mailTo(address);
      return mails.length >= count ? mails : undefined;
    },
    `${count} message(s) to ${address} in the SMTP fake`,
    timeoutMs,
  );
}

type OutboxFilter = Partial<Pick<OutboxMail, 'id' | 'teamId' | 'kind' | 'toAddress' | 'incidentId'>>;

/** Waits until an outbox row matching `where` has the status (sent, or failed after its retries). */
export async function waitForOutbox(where: OutboxFilter, status: OutboxStatus, { timeoutMs }: { timeoutMs?: number } = {}) {
  return poll(
    async () => (await OutboxMail.findOne({ where: { ...where, status } })) ?? undefined,
    `an outbox row ${JSON.stringify(where)} to be ${status}`,
    timeoutMs,
  );
}

/** The token of the one-time link in a message (`…/account-link#token=<token>`). */
export function linkTokenIn(text: string) {
  const token = /\/account-link#token=([A-Za-z0-9_-]+)/.exec(text)?.[1];
  if (!token) throw new Error(`No account link in:\n${text}`);
  return token;
}

/** Retries waited for in milliseconds instead of seconds: a test sees a message fail in well under a second. */
export const QUICK_RETRY_BASE_MS = 20;

/** The test app with quick retries; `overrides` as for testApp (e.g. SMTP_URL for a refusing server). */
export const quickRetryTestApp = (overrides: NodeJS.ProcessEnv = {}) => testApp({ MAIL_RETRY_BASE_MS: String(QUICK_RETRY_BASE_MS), ...overrides });

/**
 * An SMTP URL nothing listens on (a port the system just handed out and took back): every
 * connection is refused at once. For top-level await, before the test app is made.
 */
export async function refusingSmtpUrl() {
  const server = net.createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as net.AddressInfo;
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return `smtp://127.0.0.1:${port}`;
}
