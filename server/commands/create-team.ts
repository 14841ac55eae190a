import { hashPassword, temporaryPassword } from '../auth/passwords';
import { inTransaction } from '../db/transaction';
import { Membership, Team, User } from '../models';

/**
 * Creates a team with its first admin: the operator's way in on a real deployment. An existing
 * account becomes the admin as it is (the operator vouches for it); a new one gets a temporary
 * password, answered once.
 */
export async function createTeam(input: { number: number; name: string; adminEmail: string; adminName: string }) {
  return inTransaction(async (transaction) => {
    const team = await Team.create({ number: input.number, name: input.name }, { transaction });
    let admin = await User.findOne({ where: { email: input.adminEmail }, transaction });
    let password: string | null = null;
    if (!admin) {
      password = temporaryPassword();
      admin = await User.create({ email: input.adminEmail, name: input.adminName, passwordHash: await hashPassword(password) }, { transaction });
    }
    await Membership.create({ teamId: team.id, userId: admin.id, roles: ['admin'] }, { transaction });
    return { team, admin, temporaryPassword: password };
  });
}
