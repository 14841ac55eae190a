import type { Repair } from '../models';
import { emitToEvent } from '../realtime/broadcast';

/** Announces a ticket's change to the event room (tablets and pit screens): ids and version only. */
export const announceChanged = (repair: Repair) =>
  emitToEvent(repair.eventId, 'repairs:changed', { id: repair.id, eventId: repair.eventId, version: repair.version });

/** Cards whose order keys a crowded column re-spread: their place is news, their fields are not. */
export const announceRekeyed = (cards: readonly Repair[]) => cards.forEach(announceChanged);
