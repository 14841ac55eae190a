import { Router } from 'express';
import { MAIL_KINDS, mailFailureParams, type MailFailuresJson, type MailKind } from '../../shared/schemas/mail';
import { can } from '../../shared/roles';
import { authOf } from '../auth/require-auth';
import type { AuthContext } from '../auth/types';
import { notFound } from '../errors';
import { retryFailedMail } from '../mail/outbox';
import { OutboxMail } from '../models';
import { authorize } from '../policies/authorize';
import { presentMailFailure } from '../presenters/mail';

const FAILURES_LIMIT = 100;

/** A safety captain handles the alerts; invites and resets are account matters, for admins. */
const visibleKinds = (auth: AuthContext): readonly MailKind[] =>
  can(auth.membership.roles, 'members:manage') ? MAIL_KINDS : ['incident_alert'];

/** The team's e-mail that could not be delivered after every retry: listed, retried, dismissed. */
export function mailFailuresRouter() {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'alerts:manage');
    const failures = await OutboxMail.findAll({
      where: { teamId: auth.membership.teamId, status: 'failed', kind: visibleKinds(auth) },
      order: [
        ['failedAt', 'DESC'],
        ['id', 'ASC'],
      ],
      limit: FAILURES_LIMIT,
    });
    const body: MailFailuresJson = { failures: failures.map(presentMailFailure) };
    res.json(body);
  });

  router.post('/:id/retry', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'alerts:manage');
    const { id } = mailFailureParams.parse(req.params);
    if (!(await retryFailedMail(id, { teamId: auth.membership.teamId, kind: visibleKinds(auth) }))) throw notFound('Failed e-mail');
    res.status(202).end();
  });

  router.delete('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'alerts:manage');
    const { id } = mailFailureParams.parse(req.params);
    // Deleted, not hidden: a failed invite or reset still carries its one-time link.
    const deleted = await OutboxMail.destroy({ where: { id, status: 'failed', teamId: auth.membership.teamId, kind: visibleKinds(auth) } });
    if (deleted === 0) throw notFound('Failed e-mail');
    res.status(204).end();
  });

  return router;
}
