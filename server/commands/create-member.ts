import type { CreateMemberInput } from '../../shared/schemas/team';
import { hashPassword, temporaryPassword } from '../auth/passwords';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { Membership, Team, User } from '../models';

/**
 * Adds a member to a team: a new account with a one-time password, or a membership for an
 * account that already exists under that e-mail. Resending the same `id` returns what the
 * first call made (the password is not shown twice).
 */
export async function createMember(teamId: string, input: CreateMemberInput) {
  return inTransaction(async (transaction) => {
    // One membership write per team at a time: a resent create waits, then finds the first.
    await Team.findByPk(teamId, { transaction, lock: transaction.LOCK.UPDATE, rejectOnEmpty: true });
    if (input.id) {
      const existing = await Membership.findByPk(input.id, { include: [{ model: User, as: 'user' }], transaction });
      if (existing?.teamId === teamId) return { membership: existing, temporaryPassword: null, created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    let user = await User.findOne({ where: { email: input.email }, transaction, lock: transaction.LOCK.UPDATE });
    let password: string | null = null;
    if (!user) {
      password = temporaryPassword();
      user = await User.create({ email: input.email, name: input.name, passwordHash: await hashPassword(password) }, { transaction });
    } else if (await Membership.count({ where: { teamId, userId: user.id }, transaction })) {
      throw new HttpError(409, 'already_member', 'This e-mail is already a member of the team', {
        fields: { email: 'Already a member of the team' },
      });
    }
    const membership = await Membership.create({ id: input.id, teamId, userId: user.id, roles: input.roles }, { transaction });
    membership.user = user;
    return { membership, temporaryPassword: password, created: true };
  });
}
