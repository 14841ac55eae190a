import { Op } from 'sequelize';
import { RESET_VALID_MINUTES } from '../../shared/schemas/mail';
import { composePasswordReset } from '../mail/account-mail';
import { accountLinkUrl, hashLinkToken, newLinkToken } from '../auth/link-tokens';
import { findUserWithMemberships } from '../auth/require-auth';
import { inTransaction } from '../db/transaction';
import { enqueueMail } from '../mail/outbox';
import { AccountLink, User } from '../models';

/** More requests for one address within the hour send nothing: nobody's inbox is a target. */
export const RESETS_PER_EMAIL_PER_HOUR = 3;

/**
 * Queues a one-time link to choose a new password, when the address has an account that is active
 * in a team (who could not sign in gains nothing from a new password). The caller answers the
 * same either way. The mail is filed under the user's first team, whose Mailbox shows it.
 */
export async function requestPasswordReset(email: string, publicUrl: string) {
  const found = await findUserWithMemberships({ email });
  const teamId = found?.memberships?.[0]?.teamId;
  if (!found || !teamId) return;
  await inTransaction(async (transaction) => {
    // Two requests at once count each other.
    const user = await User.findByPk(found.id, { transaction, lock: transaction.LOCK.UPDATE, rejectOnEmpty: true });
    const now = Date.now();
    const recent = await AccountLink.count({
      where: { purpose: 'reset', userId: user.id, createdAt: { [Op.gt]: new Date(now - 3_600_000) } },
      transaction,
    });
    if (recent >= RESETS_PER_EMAIL_PER_HOUR) return;
    const token = newLinkToken();
    await AccountLink.create(
      {
        purpose: 'reset',
        tokenHash: hashLinkToken(token),
        email: user.email,
        userId: user.id,
        teamId,
        name: null,
        roles: null,
        createdById: null,
        expiresAt: new Date(now + RESET_VALID_MINUTES * 60_000),
      },
      { transaction },
    );
    await enqueueMail(transaction, [{ teamId, kind: 'password_reset', to: user.email, ...composePasswordReset({ link: accountLinkUrl(publicUrl, token) }) }]);
  });
}
