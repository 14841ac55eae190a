import { generateKeyBetween, generateNKeysBetween } from 'fractional-indexing';
import { Op, type Transaction } from 'sequelize';
import { compareBoardOrder } from '../../shared/domain/repair-board';
import { placeByUrgency, type RepairStatus, type UrgencyTicket } from '../../shared/domain/repair-urgency';
import { Repair } from '../models';
import { urgencyTicketOf } from './urgency-ticket';

/** The column of the order key: VARCHAR(64). */
const ORDER_KEY_MAX = 64;

/** A column's cards in board order, `exceptId` left out (the card being placed), read under the caller's lock. */
export async function columnOf(eventId: string, status: RepairStatus, exceptId: string | null, transaction: Transaction) {
  const cards = await Repair.findAll({ where: { eventId, status, ...(exceptId ? { id: { [Op.ne]: exceptId } } : {}) }, transaction });
  return cards.sort(compareBoardOrder);
}

/** The slot urgency gives `ticket` in `column`: how many cards come before it. */
export function urgencySlot(column: readonly Repair[], ticket: UrgencyTicket): number {
  const { afterId } = placeByUrgency(column.map(urgencyTicketOf), ticket);
  return afterId === null ? 0 : column.findIndex((card) => card.id === afterId) + 1;
}

/**
 * An order key for a card going into `slot` of `column` (listed without it): between its two
 * neighbours, so that one row is written. Keys grow by a character every few placements into the
 * same gap; in the rare column where one would outgrow its field, the column is given fresh,
 * evenly spread keys (its cards' versions stay: only where they sit was re-encoded) and their
 * ids are answered so that the caller announces them.
 */
export async function keyForSlot(column: readonly Repair[], slot: number, transaction: Transaction): Promise<{ orderKey: string; rekeyed: Repair[] }> {
  const orderKey = generateKeyBetween(column[slot - 1]?.orderKey ?? null, column[slot]?.orderKey ?? null);
  if (orderKey.length <= ORDER_KEY_MAX) return { orderKey, rekeyed: [] };
  const keys = generateNKeysBetween(null, null, column.length + 1);
  const rekeyed: Repair[] = [];
  for (const [index, card] of column.entries()) {
    const key = keys[index < slot ? index : index + 1];
    if (key === card.orderKey) continue;
    // A static update: the card's version is its fields' token, and its fields did not change.
    await Repair.update({ orderKey: key }, { where: { id: card.id }, transaction, silent: true });
    card.setDataValue('orderKey', key);
    rekeyed.push(card);
  }
  return { orderKey: keys[slot], rekeyed };
}
