import { useState, type ReactNode } from 'react';
import { useDroppable } from '@dnd-kit/core';
import { SortableContext, useSortable, type SortingStrategy } from '@dnd-kit/sortable';
import type { Landing } from '@shared/domain/repair-board';
import type { RepairStatus } from '@shared/domain/repair-urgency';
import type { RepairJson } from '@shared/schemas/repairs';
import { Button } from '../../../components/ui/button';
import { DragHandle } from '../../../components/ui/drag-handle';
import { RepairCard, type CardFacts } from './repair-card';
import { columnDropId } from './drop-target';
import { STATUS_LABELS, ticketName } from './repair-words';

// Cards do not shuffle while one is dragged: a line shows where it will land, since for the crew
// that is where urgency puts it, not where the finger is.
const stayPut: SortingStrategy = () => null;

// A long event fills Done; the open work matters more.
const DONE_SHOWN = 6;

interface ColumnCardProps {
  ticket: RepairJson;
  facts: CardFacts;
  draggable: boolean;
  saving: boolean;
  lifted: boolean;
}

function ColumnCard({ ticket, facts, draggable, saving, lifted }: ColumnCardProps) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef } = useSortable({ id: ticket.id, disabled: !draggable || saving });
  return (
    <li ref={setNodeRef} data-repair-card={ticket.id} className={`mb-3 ${lifted ? 'opacity-40' : ''}`}>
      <RepairCard
        ticket={ticket}
        facts={facts}
        saving={saving}
        handle={
          draggable && <DragHandle ref={setActivatorNodeRef} label={`Move ${ticketName(ticket.title)}`} data-drag-handle="" {...attributes} aria-disabled={saving || undefined} {...listeners} />
        }
      />
    </li>
  );
}

/** Where the dragged card will land: a bar between two cards that takes no room, so nothing jumps. */
function LandsHere() {
  return (
    <li aria-hidden="true" data-lands-here="" className="relative h-0">
      <span className="absolute inset-x-1 -top-2 h-1.5 rounded-full bg-accent" />
    </li>
  );
}

interface RepairColumnProps {
  status: RepairStatus;
  /** The cards shown in it (filters applied), in board order. */
  cards: RepairJson[];
  facts: CardFacts;
  /** The card being dragged, wherever it is. */
  activeId: string | null;
  /** Where the dragged card would land, when that is this column. */
  landing: Landing | null;
  canDrag: boolean;
  savingIds: ReadonlySet<string>;
  /** Said when the column is empty. */
  emptyText: string;
}

/** One column of the board: droppable as a whole, its cards in board order. */
export function RepairColumn({ status, cards, facts, activeId, landing, canDrag, savingIds, emptyText }: RepairColumnProps) {
  const { setNodeRef, isOver } = useDroppable({ id: columnDropId(status) });
  const [showAll, setShowAll] = useState(false);
  const headingId = `repair-column-${status}`;
  const dragging = activeId !== null;
  const limit = status === 'done' && !showAll && !dragging ? DONE_SHOWN : Infinity;
  const shown = cards.slice(0, limit);
  const hidden = cards.length - shown.length;
  const targeted = landing !== null && landing.status === status;
  const lineAt = targeted && !landing.unchanged ? landing.index : -1;

  const rows: ReactNode[] = [];
  let place = 0;
  for (const ticket of shown) {
    const lifted = ticket.id === activeId;
    if (!lifted && place === lineAt) rows.push(<LandsHere key="lands-here" />);
    if (!lifted) place += 1;
    rows.push(<ColumnCard key={ticket.id} ticket={ticket} facts={facts} draggable={canDrag} saving={savingIds.has(ticket.id)} lifted={lifted} />);
  }
  if (lineAt === place) rows.push(<LandsHere key="lands-here" />);

  return (
    <section
      ref={setNodeRef}
      aria-labelledby={headingId}
      data-column={status}
      className={`flex min-w-0 flex-col rounded-2xl border-2 p-2 md:min-h-96 ${
        dragging && (isOver || targeted) ? 'border-accent bg-accent-soft' : 'border-transparent bg-sunken'
      }`}
    >
      <div className="flex items-baseline justify-between gap-2 px-1 pt-1 pb-3">
        <h2 id={headingId} className="text-xl font-bold">
          {STATUS_LABELS[status]}
        </h2>
        <span className="font-semibold text-ink-muted tabular-nums">
          {cards.length}
          <span className="sr-only"> {cards.length === 1 ? 'ticket' : 'tickets'}</span>
        </span>
      </div>
      <SortableContext id={status} items={shown.map((ticket) => ticket.id)} strategy={stayPut}>
        <ul className="flex flex-1 flex-col" aria-labelledby={headingId}>
          {rows}
        </ul>
      </SortableContext>
      {cards.length === 0 && !targeted && <p className="px-1 pb-3 text-ink-muted">{emptyText}</p>}
      {hidden > 0 && (
        <Button variant="quiet" className="self-start" onClick={() => setShowAll(true)}>
          Show all {cards.length} done
        </Button>
      )}
    </section>
  );
}
