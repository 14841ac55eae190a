import type { Repair } from '../models';
import { emitToEvent } from '../realtime/broadcast';

/** Announces a new ticket to the event room: ids only. */
export const announceCreated = (repair: Repair) => emitToEvent(repair.eventId, 'repairs:created', { id: repair.id, eventId: repair.eventId });

/** Announces a ticket's change to the event room (tablets and pit screens): ids and version only. */
export const announceChanged = (repair: Repair) =>
  emitToEvent(repair.eventId, 'repairs:changed', { id: repair.id, eventId: repair.eventId, version: repair.version });

/** Cards whose order keys a crowded column re-spread: their place is news, their fields are not. */
export const announceRekeyed = (cards: readonly Repair[]) => cards.forEach(announceChanged);
