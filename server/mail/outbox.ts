import type { Transaction } from 'sequelize';
import type { MailKind } from '../../shared/schemas/mail';
import { OutboxMail } from '../models';

export interface MailToQueue {
  teamId: string | null;
  kind: MailKind;
  to: string;
  subject: string;
  text: string;
  incidentId?: string | null;
}

/**
 * How long the process that queued a message keeps it to itself (through all its retries);
 * after that, a message still pending is taken up by any process (the first one crashed).
 */
export const CLAIM_MS = 5 * 60_000;

type QueuedListener = (ids: string[]) => void;
let onQueued: QueuedListener | undefined;

/** The mail sender of this process registers here; before that (scripts) queued mail waits for a sweep. */
export function listenForQueuedMail(listener: QueuedListener | undefined) {
  onQueued = listener;
}

/**
 * Queues messages in the caller's transaction, one row per address; they are handed to the
 * sender only after the commit, so a rolled-back change sends nothing and a slow or refusing
 * mail server never holds up or fails the change.
 */
export async function enqueueMail(transaction: Transaction, mails: readonly MailToQueue[]) {
  if (mails.length === 0) return;
  const now = Date.now();
  const rows = await OutboxMail.bulkCreate(
    mails.map((mail) => ({
      teamId: mail.teamId,
      kind: mail.kind,
      incidentId: mail.incidentId ?? null,
      toAddress: mail.to,
      subject: mail.subject,
      text: mail.text,
      nextAttemptAt: new Date(now),
      claimedUntil: new Date(now + CLAIM_MS),
    })),
    { transaction },
  );
  const ids = rows.map((row) => row.id);
  transaction.afterCommit(() => onQueued?.(ids));
}
