import type { UpdateMemberInput } from '../../shared/schemas/team';
import { hashPassword, temporaryPassword } from '../auth/passwords';
import { endSessionsOf } from '../auth/session-store';
import { inTransaction } from '../db/transaction';
import type { Transaction } from 'sequelize';
import { HttpError, notFound, stale } from '../errors';
import { Membership, User } from '../models';
import { presentMember } from '../presenters/team';

/**
 * Changes a member's name, roles or active state, or gives them a new temporary password.
 * Deactivation and a reset end that member's sessions after the commit; a team never loses
 * its last active admin; an account shared with another team keeps its password (that team's
 * admins have no say here).
 */
export async function updateMember(teamId: string, membershipId: string, input: UpdateMemberInput) {
  const result = await inTransaction(async (transaction) => {
    const found = await Membership.findOne({
      where: { id: membershipId, teamId },
      include: [{ model: User, as: 'user' }],
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!found) throw notFound('Member');
    if (input.version !== undefined && input.version !== found.version) throw stale(presentMember(found));

    const losesAdmin =
      found.active && found.roles.includes('admin') && (input.active === false || (input.roles && !input.roles.includes('admin')));
    if (losesAdmin && (await countActiveAdmins(teamId, transaction)) <= 1) {
      throw new HttpError(409, 'last_admin', 'The team needs at least one active admin');
    }
    if (input.roles) found.roles = input.roles;
    if (input.active !== undefined) found.active = input.active;
    if (input.name) found.user!.name = input.name;
    let password: string | null = null;
    if (input.resetPassword) {
      if ((await Membership.count({ where: { userId: found.userId }, transaction })) > 1) {
        throw new HttpError(409, 'shared_account', 'This account belongs to other teams too: its owner changes the password');
      }
      password = temporaryPassword();
      found.user!.passwordHash = await hashPassword(password);
    }
    await found.user!.save({ transaction });
    await found.save({ transaction });
    return { membership: found, temporaryPassword: password };
  });
  if (input.active === false || input.resetPassword) await endSessionsOf(result.membership.userId);
  return result;
}

async function countActiveAdmins(teamId: string, transaction: Transaction) {
  const members = await Membership.findAll({ where: { teamId, active: true }, transaction });
  return members.filter((m) => m.roles.includes('admin')).length;
}
