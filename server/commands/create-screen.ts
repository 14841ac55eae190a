import type { CreateScreenInput } from '../../shared/schemas/screens';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { hashScreenToken, newScreenToken, ScreenToken, Team } from '../models';

/**
 * Adds a pit screen: a new token, answered once and stored only as its hash. Resending the same
 * `id` returns the screen the first call made, without a token (it cannot be shown again).
 */
export async function createScreen(teamId: string, createdById: string, input: CreateScreenInput) {
  return inTransaction(async (transaction) => {
    // One screen write per team at a time: a resent create waits, then finds the first.
    await Team.lockRow(teamId, transaction);
    if (input.id) {
      const existing = await ScreenToken.findByPk(input.id, { transaction });
      if (existing?.teamId === teamId) return { screen: existing, token: null, created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    const token = newScreenToken();
    const screen = await ScreenToken.create(
      { id: input.id, teamId, name: input.name, tokenHash: hashScreenToken(token), createdById },
      { transaction },
    );
    return { screen, token, created: true };
  });
}
