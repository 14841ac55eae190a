import { Router } from 'express';
import { z } from 'zod';
import { createMemberSchema, updateMemberSchema } from '../../shared/schemas/team';
import { can } from '../../shared/roles';
import { authOf } from '../auth/require-auth';
import { createMember } from '../commands/create-member';
import { updateMember } from '../commands/update-member';
import { Membership, Team, User } from '../models';
import { authorize } from '../policies/authorize';
import { presentMember, presentTeam } from '../presenters/team';

const memberParams = z.object({ id: z.uuid({ message: 'Must be a UUID' }) });

export function teamRouter() {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'team:read');
    const team = await Team.findByPk(auth.membership.teamId, { rejectOnEmpty: true });
    res.json(presentTeam(team));
  });

  router.get('/members', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'members:read');
    const members = await Membership.findAll({
      where: { teamId: auth.membership.teamId },
      include: [{ model: User, as: 'user' }],
      order: [
        [{ model: User, as: 'user' }, 'name', 'ASC'],
        ['createdAt', 'ASC'],
        ['id', 'ASC'],
      ],
    });
    const withEmail = can(auth.membership.roles, 'members:manage');
    res.json(members.map((member) => presentMember(member, { withEmail })));
  });

  router.post('/members', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'members:manage');
    const input = createMemberSchema.parse(req.body);
    const { membership, temporaryPassword, created } = await createMember(auth.membership.teamId, input);
    res.status(created ? 201 : 200).json({ ...presentMember(membership), temporaryPassword });
  });

  router.patch('/members/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'members:manage');
    const { id } = memberParams.parse(req.params);
    const input = updateMemberSchema.parse(req.body);
    const { membership, temporaryPassword } = await updateMember(auth.membership.teamId, id, input);
    res.json(input.resetPassword ? { ...presentMember(membership), temporaryPassword } : presentMember(membership));
  });

  return router;
}
