import { DatabaseError, type Transaction } from 'sequelize';
import { Team } from '../models';

const ER_LOCK_DEADLOCK = 1213;
const ATTEMPTS = 3;

const isDeadlock = (error: unknown) =>
  error instanceof DatabaseError && (error.parent as { errno?: number } | undefined)?.errno === ER_LOCK_DEADLOCK;

/**
 * Runs `work` in one transaction on the database the models are bound to. InnoDB may pick a
 * transaction as a deadlock victim when two tablets write at once; it was rolled back whole, so
 * running it again is safe, and a lost write would be worse than a short wait.
 */
export async function inTransaction<T>(work: (transaction: Transaction) => Promise<T>): Promise<T> {
  const sequelize = Team.sequelize;
  if (!sequelize) throw new Error('Models are not bound to a database yet');
  for (let attempt = 1; ; attempt++) {
    try {
      return await sequelize.transaction(work);
    } catch (error) {
      if (attempt >= ATTEMPTS || !isDeadlock(error)) throw error;
    }
  }
}
