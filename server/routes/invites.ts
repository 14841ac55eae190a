import { Router } from 'express';
import { Op } from 'sequelize';
import { createInviteSchema, inviteParams, type InvitesJson } from '../../shared/schemas/mail';
import { authOf } from '../auth/require-auth';
import { createInvite } from '../commands/create-invite';
import { notFound } from '../errors';
import { AccountLink } from '../models';
import { authorize } from '../policies/authorize';
import { presentInvite } from '../presenters/mail';

const pending = () => ({ purpose: 'invite' as const, usedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } });

/** Invites by e-mail: made, listed while they can still be used, withdrawn. */
export function invitesRouter({ publicUrl }: { publicUrl: string }) {
  const router = Router();

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'members:manage');
    const input = createInviteSchema.parse(req.body);
    const invite = await createInvite({ teamId: auth.membership.teamId, invitedBy: auth.user }, input, publicUrl);
    // Accepted, not done: the e-mail is on its way, and the invite is only used later.
    res.status(202).json({ invite: presentInvite(invite) });
  });

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'members:manage');
    const invites = await AccountLink.findAll({
      where: { teamId: auth.membership.teamId, ...pending() },
      order: [
        ['createdAt', 'DESC'],
        ['id', 'ASC'],
      ],
    });
    const body: InvitesJson = { invites: invites.map(presentInvite) };
    res.json(body);
  });

  router.delete('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'members:manage');
    const { id } = inviteParams.parse(req.params);
    const [revoked] = await AccountLink.update({ revokedAt: new Date() }, { where: { id, teamId: auth.membership.teamId, ...pending() } });
    if (revoked === 0) throw notFound('Invite');
    res.status(204).end();
  });

  return router;
}
