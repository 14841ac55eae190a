import { createHash, randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { HttpError } from '../errors';
import { AccountLink } from '../models';

/** 32 random bytes, URL-safe: the part of the link only the e-mail carries. */
export const newLinkToken = () => randomBytes(32).toString('base64url');

/** Only this is stored: a copy of the database does not open any link. */
export const hashLinkToken = (token: string) => createHash('sha256').update(token).digest('hex');

/** One answer for unknown, used, revoked and expired links: the link holder learns nothing more. */
export const linkNotValid = () =>
  new HttpError(404, 'link_not_valid', 'This link is not valid: it was used already, withdrawn, or it expired. Ask for a new one.');

/** Where the e-mail's link leads: the token after `#`, so it never reaches a server log or a Referer. */
export const accountLinkUrl = (publicUrl: string, token: string) => `${publicUrl}/account-link#token=${token}`;

/**
 * The text of a sent e-mail without the tokens of its links: the outbox keeps that much, so that
 * once the e-mail is out, only the recipient's inbox opens the link, never a copy of the database.
 */
export const withoutLinkTokens = (text: string) => text.replace(/(\/account-link#token=)[A-Za-z0-9_-]+/g, '$1(in the e-mail only)');

/** The link of this token when it can still be used; with a transaction, locked until it ends. */
export async function usableLink(token: string, transaction?: Transaction) {
  const link = await AccountLink.findOne({
    where: { tokenHash: hashLinkToken(token), usedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } },
    ...(transaction ? { transaction, lock: transaction.LOCK.UPDATE } : {}),
  });
  if (!link) throw linkNotValid();
  return link;
}
