import { passwordField } from '../../shared/schemas/session';
import { linkNotValid, usableLink } from '../auth/link-tokens';
import { hashPassword, verifyPassword } from '../auth/passwords';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { AccountLink, Membership, Team, User } from '../models';

const passwordProblem = (message: string) => new HttpError(400, 'invalid', 'Check these fields: password', { fields: { password: message } });

async function newPasswordHash(password: string) {
  const checked = passwordField.safeParse(password);
  if (!checked.success) throw passwordProblem(checked.error.issues[0].message);
  return hashPassword(password);
}

/**
 * Uses a one-time link, once: a reset sets the new password (and spends every other reset link
 * of the account); an invite makes the account and its membership, or, for an address with an
 * account already, adds the membership once that account's password is given. Returns who to
 * sign in and in which team (null: the account's first).
 */
export async function useAccountLink(token: string, password: string) {
  return inTransaction(async (transaction) => {
    const link = await usableLink(token, transaction);
    const usedAt = new Date();
    if (link.purpose === 'reset') {
      const user = link.userId ? await User.findByPk(link.userId, { transaction }) : null;
      if (!user) throw linkNotValid();
      await user.update({ passwordHash: await newPasswordHash(password) }, { transaction });
      await AccountLink.update({ usedAt }, { where: { purpose: 'reset', userId: user.id, usedAt: null }, transaction });
      return { purpose: link.purpose, userId: user.id, teamId: null };
    }

    const { teamId, roles } = link;
    if (!teamId || !roles?.length) throw linkNotValid();
    await Team.lockRow(teamId, transaction);
    let user = await User.findOne({ where: { email: link.email }, transaction });
    if (user) {
      if (!(await verifyPassword(password, user.passwordHash))) throw passwordProblem('Not the password of the account of this e-mail address');
      const membership = await Membership.findOne({ where: { teamId, userId: user.id }, transaction });
      // Deactivated after the invite was sent: the team's later decision stands.
      if (membership && !membership.active) throw linkNotValid();
      if (!membership) await Membership.create({ teamId, userId: user.id, roles }, { transaction });
    } else {
      user = await User.create({ email: link.email, name: link.name ?? link.email, passwordHash: await newPasswordHash(password) }, { transaction });
      await Membership.create({ teamId, userId: user.id, roles }, { transaction });
    }
    await link.update({ usedAt }, { transaction });
    return { purpose: link.purpose, userId: user.id, teamId };
  });
}
