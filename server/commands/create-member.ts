import type { CreateMemberInput } from '../../shared/schemas/team';
import { hashPassword, temporaryPassword } from '../auth/passwords';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { Membership, Team, User } from '../models';

/**
 * Adds a member to a team: a new account with a one-time password. An e-mail that already has
 * an account is refused (here or with another team). Resending the same `id` returns what the
 * first call made (the password is not shown twice).
 */
export async function createMember(teamId: string, input: CreateMemberInput) {
  return inTransaction(async (transaction) => {
    // One membership write per team at a time: a resent create waits, then finds the first.
    await Team.lockRow(teamId, transaction);
    if (input.id) {
      const existing = await Membership.findByPk(input.id, { include: [{ model: User, as: 'user' }], transaction });
      if (existing?.teamId === teamId) return { membership: existing, temporaryPassword: null, created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    const user = await User.findOne({ where: { email: input.email }, transaction });
    if (user) {
      const here = await Membership.count({ where: { teamId, userId: user.id }, transaction });
      throw here
        ? new HttpError(409, 'already_member', 'This e-mail is already a member of the team', {
            fields: { email: 'Already a member of the team' },
          })
        : // Linking someone else's account would let this team's admins act for it elsewhere.
          new HttpError(409, 'account_exists', 'This e-mail already has a Pitwright account with another team', {
            fields: { email: 'Already has an account with another team: ask them to use another e-mail' },
          });
    }
    const password = temporaryPassword();
    const created = await User.create({ email: input.email, name: input.name, passwordHash: await hashPassword(password) }, { transaction });
    const membership = await Membership.create({ id: input.id, teamId, userId: created.id, roles: input.roles }, { transaction });
    membership.user = created;
    return { membership, temporaryPassword: password, created: true };
  });
}
