import nodemailer from 'nodemailer';
import { ConnectionError } from 'sequelize';
import { withoutLinkTokens } from '../auth/link-tokens';
import { OutboxMail } from '../models';
import { CLAIM_MS, claimDueMail, listenForQueuedMail } from './outbox';

/** The first try and three retries: a relay down for a minute or two still gets the message. */
export const MAIL_ATTEMPTS = 4;
const SWEEP_MS = 60_000;
const SWEEP_BATCH = 50;
const SMTP_TIMEOUT_MS = 10_000;
const ERROR_LENGTH = 300;

interface MailSettings {
  url: string;
  from: string;
  retryBaseMs: number;
}

/** Waits before retry n (1-based): base, 4 × base, 16 × base. */
export const retryDelayMs = (retryBaseMs: number, retry: number) => retryBaseMs * 4 ** (retry - 1);

// Kept short and single-line: shown on the Team page, never a stack trace.
const shortError = (error: unknown) => {
  const message = (error instanceof Error ? error.message : String(error)).split('\n')[0].trim() || 'Unknown error';
  return message.length > ERROR_LENGTH ? `${message.slice(0, ERROR_LENGTH - 1)}…` : message;
};

/**
 * Sends the outbox: each message as soon as its change committed, again after a failure with
 * growing waits, and marked failed after the last attempt. A sweep takes up messages left by a
 * process that stopped mid-way. Nothing here ever throws into a request.
 */
export function createMailDispatcher(settings: MailSettings) {
  const transport = nodemailer.createTransport({
    url: settings.url,
    connectionTimeout: SMTP_TIMEOUT_MS,
    greetingTimeout: SMTP_TIMEOUT_MS,
    socketTimeout: SMTP_TIMEOUT_MS,
  });
  const timers = new Set<NodeJS.Timeout>();
  let stopped = false;
  let leave: (() => void) | undefined;

  const later = (work: () => void, ms: number) => {
    // stop() may land while an attempt is still writing its outcome: it must not leave a timer behind.
    if (stopped) return;
    const timer = setTimeout(() => {
      timers.delete(timer);
      work();
    }, ms);
    // A pending retry must not keep a stopping process alive: the sweep of the next one sends it.
    timer.unref();
    timers.add(timer);
  };

  const guarded = (work: () => Promise<void>) => {
    work().catch((error: unknown) => {
      // After stop the database may be closed already, and an unreachable one is the health
      // route's news: either way the row keeps its claim and a later sweep takes it up.
      if (!stopped && !(error instanceof ConnectionError)) console.error(`Mail: ${shortError(error)}`);
    });
  };

  async function attempt(id: string) {
    if (stopped) return;
    const mail = await OutboxMail.findByPk(id);
    if (!mail || mail.status !== 'pending') return;
    const attempts = mail.attempts + 1;
    await mail.update({ attempts, claimedUntil: new Date(Date.now() + CLAIM_MS) });
    try {
      await transport.sendMail({
        from: settings.from,
        to: mail.toAddress,
        subject: mail.subject,
        text: mail.text,
        headers: { 'X-Pitwright-Kind': mail.kind, ...(mail.teamId ? { 'X-Pitwright-Team': mail.teamId } : {}) },
      });
    } catch (error) {
      if (stopped) return;
      if (attempts >= MAIL_ATTEMPTS) {
        await mail.update({ status: 'failed', failedAt: new Date(), lastError: shortError(error), claimedUntil: null });
        return;
      }
      const wait = retryDelayMs(settings.retryBaseMs, attempts);
      const nextAttemptAt = new Date(Date.now() + wait);
      await mail.update({ lastError: shortError(error), nextAttemptAt, claimedUntil: new Date(nextAttemptAt.getTime() + CLAIM_MS) });
      later(() => guarded(() => attempt(id)), wait);
      return;
    }
    await mail.update({ status: 'sent', sentAt: new Date(), lastError: null, claimedUntil: null, text: withoutLinkTokens(mail.text) });
  }

  /** Takes up the messages a stopped process left behind. */
  async function sweep() {
    for (const id of await claimDueMail(SWEEP_BATCH)) guarded(() => attempt(id));
  }

  function sweepAndRepeat() {
    guarded(sweep);
    later(sweepAndRepeat, SWEEP_MS);
  }

  return {
    start() {
      leave = listenForQueuedMail((ids) => ids.forEach((id) => guarded(() => attempt(id))));
      sweepAndRepeat();
    },
    stop() {
      stopped = true;
      leave?.();
      for (const timer of timers) clearTimeout(timer);
      timers.clear();
      transport.close();
    },
  };
}

