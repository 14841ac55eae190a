import { Router } from 'express';
import type { MailboxJson } from '../../shared/schemas/mail';
import { authOf } from '../auth/require-auth';
import { HttpError } from '../errors';
import { CapturedMail } from '../models';
import { authorize } from '../policies/authorize';
import { presentMailboxMessage } from '../presenters/mail';

const MAILBOX_LIMIT = 200;

/** What the local SMTP fake received for the caller's team: the pit's inbox while no mail leaves. */
export function mailboxRouter({ usesFake }: { usesFake: boolean }) {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'mailbox:read');
    if (!usesFake) {
      throw new HttpError(404, 'mailbox_off', 'There is no Mailbox: e-mail is sent through a real mail server (SMTP_URL)');
    }
    const messages = await CapturedMail.findAll({
      where: { teamId: auth.membership.teamId },
      order: [
        ['receivedAt', 'DESC'],
        ['id', 'ASC'],
      ],
      limit: MAILBOX_LIMIT,
    });
    const body: MailboxJson = { messages: messages.map(presentMailboxMessage) };
    res.json(body);
  });

  return router;
}
