import type { InviteJson, MailboxMessageJson, MailFailureJson } from '../../shared/schemas/mail';
import type { AccountLink, CapturedMail, OutboxMail } from '../models';

export function presentMailFailure(mail: OutboxMail): MailFailureJson {
  return {
    id: mail.id,
    kind: mail.kind,
    to: mail.toAddress,
    subject: mail.subject,
    attempts: mail.attempts,
    lastError: mail.lastError ?? '',
    failedAt: (mail.failedAt ?? mail.updatedAt).toISOString(),
    incidentId: mail.incidentId,
  };
}

export function presentMailboxMessage(mail: CapturedMail): MailboxMessageJson {
  return { id: mail.id, to: mail.toAddresses, subject: mail.subject, receivedAt: mail.receivedAt.toISOString(), text: mail.text };
}

export function presentInvite(link: AccountLink): InviteJson {
  return {
    id: link.id,
    name: link.name ?? '',
    email: link.email,
    roles: link.roles ?? [],
    expiresAt: link.expiresAt.toISOString(),
    createdAt: link.createdAt.toISOString(),
  };
}
