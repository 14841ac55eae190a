import type { Announcements, UniqueIdentifier } from '@dnd-kit/core';
import type { Landing } from '@shared/domain/repair-board';
import type { RepairStatus } from '@shared/domain/repair-urgency';
import { STATUS_LABELS } from './repair-words';

export interface AnnouncementSource {
  /** The ticket's title and where it sits now. */
  ticketOf: (id: UniqueIdentifier) => { title: string; status: RepairStatus; position: number; of: number } | null;
  /** Where the card would land now (set by the board's handlers, which run before these). */
  landing: () => Landing | null;
}

/**
 * What a screen reader hears while a card moves, in plain words: "Picked up ticket Arm chain off
 * in Reported, position 1 of 3", "Moved Arm chain off to In progress, position 2 of 3", "Arm
 * chain off dropped in In progress, position 2 of 3", "Move cancelled".
 */
export function boardAnnouncements({ ticketOf, landing }: AnnouncementSource): Announcements {
  // Right after the lift the card is over its own place: saying so would cut off "Picked up".
  let movedAway = false;
  const name = (id: UniqueIdentifier) => ticketOf(id)?.title ?? 'the ticket';
  const where = (id: UniqueIdentifier) => {
    const ticket = ticketOf(id);
    return ticket ? `${STATUS_LABELS[ticket.status]}, position ${ticket.position} of ${ticket.of}` : 'its column';
  };
  const to = (target: Landing) => `${STATUS_LABELS[target.status]}, position ${target.position} of ${target.of}`;
  return {
    onDragStart: ({ active }) => {
      movedAway = false;
      return `Picked up ticket ${name(active.id)} in ${where(active.id)}.`;
    },
    onDragOver: ({ active }) => {
      const target = landing();
      if (!target) return `${name(active.id)} is outside the columns. Dropping it there leaves it where it was.`;
      if (target.unchanged && !movedAway) return undefined;
      movedAway = true;
      return target.unchanged ? `${name(active.id)} is back at its place in ${where(active.id)}.` : `Moved ${name(active.id)} to ${to(target)}.`;
    },
    onDragEnd: ({ active }) => {
      const target = landing();
      if (!target) return `${name(active.id)} dropped outside the columns. It stays in ${where(active.id)}.`;
      if (target.unchanged) return `${name(active.id)} dropped back in ${where(active.id)}.`;
      return `${name(active.id)} dropped in ${to(target)}.`;
    },
    onDragCancel: ({ active }) => `Move cancelled. ${name(active.id)} stays in ${where(active.id)}.`,
  };
}

export const screenReaderInstructions = {
  draggable:
    'To move a ticket, press Space on its handle, then the arrow keys to carry it to another column or place (columns sit side by side on a wide screen, one below the other on a phone). Press Space to drop it, Escape to put it back.',
};
