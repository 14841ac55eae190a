import type { CreateInviteInput } from '../../shared/schemas/mail';
import { INVITE_VALID_DAYS } from '../../shared/schemas/mail';
import { composeInvite } from '../mail/account-mail';
import { accountLinkUrl, hashLinkToken, newLinkToken } from '../auth/link-tokens';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { enqueueMail } from '../mail/outbox';
import { AccountLink, Membership, Team, User } from '../models';

const alreadyMember = () =>
  new HttpError(409, 'already_member', 'This e-mail is already a member of the team', { fields: { email: 'Already a member of the team' } });

/**
 * Invites someone by e-mail: a one-time link to join the team, which replaces any earlier invite
 * of the address. The answer is the same whether or not the address has an account (with another
 * team): whether it has one is decided when the link is used. Resending the same `id` returns the
 * first invite and sends nothing more.
 */
export async function createInvite({ teamId, invitedBy }: { teamId: string; invitedBy: User }, input: CreateInviteInput, publicUrl: string) {
  return inTransaction(async (transaction) => {
    const team = await Team.lockRow(teamId, transaction);
    if (input.id) {
      const existing = await AccountLink.findByPk(input.id, { transaction });
      if (existing?.purpose === 'invite' && existing.teamId === teamId) return existing;
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    const user = await User.findOne({ where: { email: input.email }, transaction });
    if (user && (await Membership.count({ where: { teamId, userId: user.id }, transaction }))) throw alreadyMember();

    const now = new Date();
    await AccountLink.update(
      { revokedAt: now },
      { where: { purpose: 'invite', teamId, email: input.email, usedAt: null, revokedAt: null }, transaction },
    );
    const token = newLinkToken();
    const invite = await AccountLink.create(
      {
        id: input.id,
        purpose: 'invite',
        tokenHash: hashLinkToken(token),
        email: input.email,
        userId: null,
        teamId,
        name: input.name,
        roles: input.roles,
        createdById: invitedBy.id,
        expiresAt: new Date(now.getTime() + INVITE_VALID_DAYS * 24 * 3_600_000),
      },
      { transaction },
    );
    const mail = composeInvite({
      name: input.name,
      teamName: team.name,
      teamNumber: team.number,
      invitedBy: invitedBy.name,
      roles: input.roles,
      link: accountLinkUrl(publicUrl, token),
    });
    await enqueueMail(transaction, [{ teamId, kind: 'invite', to: input.email, ...mail }]);
    return invite;
  });
}
