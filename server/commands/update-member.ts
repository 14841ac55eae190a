import type { UpdateMemberInput } from '../../shared/schemas/team';
import { hashPassword, temporaryPassword } from '../auth/passwords';
import { endSessionsOf, sessionsOf } from '../auth/session-store';
import { inTransaction } from '../db/transaction';
import type { Transaction } from 'sequelize';
import { HttpError, notFound, stale } from '../errors';
import { Membership, Team, User } from '../models';
import { presentMember } from '../presenters/team';
import { followRoles } from '../realtime/broadcast';

/**
 * Changes a member's name, roles or active state, or gives them a new temporary password.
 * Deactivation ends that member's sessions in this team, a reset all of them; a team never
 * loses its last active admin; an account shared with another team keeps its name and password
 * (that team's admins have no say here).
 */
export async function updateMember(teamId: string, membershipId: string, input: UpdateMemberInput) {
  const result = await inTransaction(async (transaction) => {
    // Serialises member changes per team, so two admins demoting each other cannot both pass the last-admin check.
    await Team.lockRow(teamId, transaction);
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
    const touchesAccount = input.resetPassword || (input.name !== undefined && input.name !== found.user!.name);
    if (touchesAccount && (await Membership.count({ where: { userId: found.userId }, transaction })) > 1) {
      throw new HttpError(409, 'shared_account', 'This account belongs to other teams too: only its owner changes its name or password');
    }
    if (input.name) found.user!.name = input.name;
    let password: string | null = null;
    if (input.resetPassword) {
      password = temporaryPassword();
      found.user!.passwordHash = await hashPassword(password);
    }
    // A change to the user alone (name, password) is still a change to this member: count the version up.
    if (found.user!.changed()) found.changed('updatedAt', true);
    await found.user!.save({ transaction });
    await found.save({ transaction });
    return { membership: found, temporaryPassword: password };
  });
  if (input.resetPassword) await endSessionsOf(result.membership.userId);
  // Only the sessions working in this team end: the account may be active in another team.
  else if (input.active === false) await endSessionsOf(result.membership.userId, { teamId });
  // Live sockets follow the new roles into or out of role-only rooms (the safety log's).
  else if (input.roles) followRoles(await sessionsOf(result.membership.userId, { teamId }), teamId, result.membership.roles);
  return result;
}

async function countActiveAdmins(teamId: string, transaction: Transaction) {
  const members = await Membership.findAll({ where: { teamId, active: true }, transaction });
  return members.filter((m) => m.roles.includes('admin')).length;
}
