import { randomInt } from 'node:crypto';
import bcrypt from 'bcryptjs';

const COST = 10;
// Compared against when the e-mail is unknown, so timing does not tell which accounts exist.
const DECOY_HASH = bcrypt.hashSync('decoy-password-never-matches', COST);

export const hashPassword = (password: string) => bcrypt.hash(password, COST);

export const verifyPassword = (password: string, hash: string | undefined) =>
  bcrypt.compare(password, hash ?? DECOY_HASH).then((matches) => matches && hash !== undefined);

// No 0/O/1/l/I: a temporary password is read aloud across a noisy pit.
const ALPHABET = 'abcdefghijkmnpqrstuvwxyzABCDEFGHJKLMNPQRSTUVWXYZ23456789';

/** A one-time password for a new member: 4 groups of 4, about 93 bits. */
export function temporaryPassword(): string {
  const groups = Array.from({ length: 4 }, () =>
    Array.from({ length: 4 }, () => ALPHABET[randomInt(ALPHABET.length)]).join(''),
  );
  return groups.join('-');
}
