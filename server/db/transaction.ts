import type { Transaction } from 'sequelize';
import { Team } from '../models';

/** Runs `work` in one transaction on the database the models are bound to. */
export function inTransaction<T>(work: (transaction: Transaction) => Promise<T>): Promise<T> {
  const sequelize = Team.sequelize;
  if (!sequelize) throw new Error('Models are not bound to a database yet');
  return sequelize.transaction(work);
}
