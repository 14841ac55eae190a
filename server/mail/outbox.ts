import { Op, type Transaction } from 'sequelize';
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

/**
 * The mail sender of this process registers here; before that (scripts) queued mail waits for a
 * sweep. Returns the way to leave, which leaves alone a sender registered since.
 */
export function listenForQueuedMail(listener: QueuedListener) {
  onQueued = listener;
  return () => {
    if (onQueued === listener) onQueued = undefined;
  };
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

/**
 * Puts a message that failed back in the queue with a fresh set of attempts, claimed by this
 * process and handed to its sender at once. False when there is no such failed message.
 */
export async function retryFailedMail(id: string, where: { teamId: string; kind: readonly MailKind[] }) {
  const now = Date.now();
  const [changed] = await OutboxMail.update(
    { status: 'pending', attempts: 0, lastError: null, failedAt: null, nextAttemptAt: new Date(now), claimedUntil: new Date(now + CLAIM_MS) },
    { where: { id, status: 'failed', teamId: where.teamId, kind: { [Op.in]: where.kind } } },
  );
  if (changed === 0) return false;
  onQueued?.([id]);
  return true;
}

const claimRanOut = () => ({ [Op.or]: [{ claimedUntil: null }, { claimedUntil: { [Op.lt]: new Date() } }] });

/**
 * Claims messages that are due and held by nobody (their process stopped mid-way). Each claim is
 * a conditional update, so when two processes sweep at once, one of them wins each message.
 */
export async function claimDueMail(limit: number) {
  const due = await OutboxMail.findAll({
    attributes: ['id'],
    where: { status: 'pending', nextAttemptAt: { [Op.lte]: new Date() }, ...claimRanOut() },
    order: [['nextAttemptAt', 'ASC']],
    limit,
  });
  const claimed: string[] = [];
  for (const { id } of due) {
    const [won] = await OutboxMail.update({ claimedUntil: new Date(Date.now() + CLAIM_MS) }, { where: { id, status: 'pending', ...claimRanOut() } });
    if (won === 1) claimed.push(id);
  }
  return claimed;
}
