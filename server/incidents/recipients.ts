import type { Transaction } from 'sequelize';
import type { AlertRuleJson } from '../../shared/schemas/mail';
import { Membership, User } from '../models';

/**
 * Who a rule reaches: the active members of the team holding any of its roles (their account's
 * address), then its extra addresses; each address once, whatever its letter case.
 */
export async function recipientsOf(teamId: string, rule: Pick<AlertRuleJson, 'roles' | 'extraAddresses'>, transaction?: Transaction): Promise<string[]> {
  const members =
    rule.roles.length === 0
      ? []
      : await Membership.findAll({
          where: { teamId, active: true },
          include: [{ model: User, as: 'user', attributes: ['email'] }],
          order: [['createdAt', 'ASC'], ['id', 'ASC']],
          transaction,
        });
  const addresses = [
    ...members.filter((member) => member.roles.some((role) => rule.roles.includes(role))).map((member) => member.user!.email),
    ...rule.extraAddresses,
  ];
  const seen = new Set<string>();
  return addresses.filter((address) => {
    const folded = address.toLowerCase();
    if (seen.has(folded)) return false;
    seen.add(folded);
    return true;
  });
}
