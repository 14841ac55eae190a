import { useEffect, useMemo, useRef, useState } from 'react';
import {
  closestCorners,
  DndContext,
  DragOverlay,
  pointerWithin,
  type CollisionDetection,
  type DragEndEvent,
  type DragMoveEvent,
  type DragOverEvent,
  type DragStartEvent,
  type UniqueIdentifier,
} from '@dnd-kit/core';
import { landingOf, positionIn, type DropTarget, type Landing } from '@shared/domain/repair-board';
import { REPAIR_STATUSES, type RepairStatus } from '@shared/domain/repair-urgency';
import type { RepairJson } from '@shared/schemas/repairs';
import { DragHandle } from '../../../components/ui/drag-handle';
import { useDragSensors } from '../../../components/ui/drag-sensors';
import { usePrefersReducedMotion } from '../../../lib/use-reduced-motion';
import { staleRepair } from '../api/repairs-cache';
import { useMoveRepair, type MoveRepairVariables } from '../api/move-repair';
import { boardAnnouncements, screenReaderInstructions } from './board-announcements';
import { indexAtY, statusOfColumnId } from './drop-target';
import { MoveNotice, type MoveProblem } from './move-notice';
import { RepairCard, type CardFacts } from './repair-card';
import { RepairColumn } from './repair-column';
import { ticketName } from './repair-words';

const EMPTY_TEXT: Record<RepairStatus, string> = {
  reported: 'Nothing reported.',
  in_progress: 'Nobody is fixing anything.',
  needs_test: 'Nothing waits for a test.',
  done: 'Nothing done yet.',
};

// A pointer (mouse, pen, finger) picks the column it is in and the place by height; the keyboard
// jumps from card to card, so the nearest droppable decides.
const collisions: CollisionDetection = (args) => {
  if (!args.pointerCoordinates) return closestCorners(args);
  return pointerWithin(args).filter((collision) => statusOfColumnId(collision.id) !== null);
};

interface RepairBoardProps {
  eventId: string;
  /** Every ticket of the event (placement reads whole columns, as the server does). */
  tickets: RepairJson[];
  /** The cards shown per column (filters applied), in board order. */
  shown: Record<RepairStatus, RepairJson[]>;
  facts: CardFacts;
  canWork: boolean;
  canPlaceByHand: boolean;
}

/**
 * The four columns with drag and drop (finger after a short hold, mouse, pen, keyboard). The crew
 * drops a card into a column and urgency places it there, as the server will; leads and mentors
 * also place cards by hand. The move shows at once and is confirmed or undone by the server.
 */
export function RepairBoard({ eventId, tickets, shown, facts, canWork, canPlaceByHand }: RepairBoardProps) {
  const sensors = useDragSensors();
  const reducedMotion = usePrefersReducedMotion();
  const move = useMoveRepair(eventId);
  const boardRef = useRef<HTMLDivElement>(null);
  const [activeId, setActiveId] = useState<string | null>(null);
  const [landing, setLanding] = useState<Landing | null>(null);
  const landingRef = useRef<Landing | null>(null);
  const [problem, setProblem] = useState<MoveProblem | null>(null);
  const [savingIds, setSavingIds] = useState<ReadonlySet<string>>(new Set());

  // A card moved with the keyboard is drawn anew in its new column: the focus follows it there, to
  // its handle, so the next move starts where the last one ended.
  const refocus = useRef<{ id: string; status: RepairStatus } | null>(null);
  useEffect(() => {
    const wanted = refocus.current;
    if (!wanted) return;
    const handle = boardRef.current?.querySelector<HTMLElement>(`[data-column="${wanted.status}"] [data-repair-card="${wanted.id}"] [data-drag-handle]`);
    if (!handle) return;
    refocus.current = null;
    handle.focus();
  });

  const byId = useMemo(() => new Map(tickets.map((ticket) => [ticket.id, ticket])), [tickets]);
  const active = activeId ? (byId.get(activeId) ?? null) : null;

  const rectOf = (id: string) => boardRef.current?.querySelector(`[data-repair-card="${id}"]`)?.getBoundingClientRect();

  function targetOf({ active: dragged, over, activatorEvent }: DragMoveEvent | DragOverEvent | DragEndEvent): DropTarget | null {
    if (!over) return null;
    const ticketId = String(dragged.id);
    const status = statusOfColumnId(over.id) ?? byId.get(String(over.id))?.status;
    if (!status) return null;
    const column = shown[status];
    if (activatorEvent instanceof KeyboardEvent) {
      // From card to card: it takes the place of the card it is over (before it in another column).
      if (statusOfColumnId(over.id)) return { status, index: column.filter((card) => card.id !== ticketId).length };
      return { status, index: Math.max(0, column.findIndex((card) => card.id === String(over.id))) };
    }
    const rect = dragged.rect.current.translated;
    if (!rect) return null;
    return { status, index: indexAtY(column.filter((card) => card.id !== ticketId), rect.top + rect.height / 2, rectOf) };
  }

  function follow(event: DragMoveEvent | DragOverEvent | DragEndEvent): Landing | null {
    const ticket = byId.get(String(event.active.id));
    const target = targetOf(event);
    const next = ticket && target ? landingOf({ tickets, shown, ticket, target, byHandAllowed: canPlaceByHand }) : null;
    landingRef.current = next;
    setLanding((old) => (old && next && old.status === next.status && old.index === next.index && old.unchanged === next.unchanged ? old : next));
    return next;
  }

  function send(variables: MoveRepairVariables, keyboard = false) {
    setProblem(null);
    const id = variables.ticket.id;
    setSavingIds((old) => new Set(old).add(id));
    if (keyboard) refocus.current = { id, status: variables.status };
    // Per call, not `mutate(variables, { onError, onSettled })`: those fire for the latest call
    // only, so a card moved while another's move was on its way would stay "saving" for good.
    move
      .mutateAsync(variables)
      .catch((error: unknown) => {
        const theirs = staleRepair(error);
        // Back in its old column, or where the other person put it: the focus goes along.
        if (keyboard) refocus.current = { id, status: theirs?.status ?? variables.ticket.status };
        setProblem({ error, variables, theirs });
      })
      .finally(() =>
        setSavingIds((old) => {
          const next = new Set(old);
          next.delete(id);
          return next;
        }),
      );
  }

  function onDragStart({ active: dragged }: DragStartEvent) {
    setActiveId(String(dragged.id));
    const ticket = byId.get(String(dragged.id));
    const start = ticket ? { status: ticket.status, index: Math.max(0, shown[ticket.status].findIndex((card) => card.id === ticket.id)) } : null;
    const first = ticket && start ? landingOf({ tickets, shown, ticket, target: start, byHandAllowed: canPlaceByHand }) : null;
    landingRef.current = first;
    setLanding(first);
  }

  function onDragEnd(event: DragEndEvent) {
    const ticket = byId.get(String(event.active.id));
    const drop = follow(event);
    setActiveId(null);
    setLanding(null);
    if (!ticket || !drop || drop.unchanged) return;
    send({ ticket, status: drop.status, byHand: drop.byHand }, event.activatorEvent instanceof KeyboardEvent);
  }

  function onDragCancel() {
    landingRef.current = null;
    setActiveId(null);
    setLanding(null);
  }

  const announcements = useMemo(
    () =>
      boardAnnouncements({
        ticketOf: (id: UniqueIdentifier) => {
          const ticket = byId.get(String(id));
          if (!ticket) return null;
          return { title: ticket.title, status: ticket.status, ...positionIn(shown[ticket.status], ticket.id) };
        },
        landing: () => landingRef.current,
      }),
    [byId, shown],
  );

  function retry(current: MoveProblem) {
    const { variables, theirs } = current;
    // The card as the board shows it now: the other person's version, or a newer one since.
    const ticket = byId.get(variables.ticket.id) ?? theirs ?? variables.ticket;
    // Neighbours chosen by hand may have moved too; then urgency places it.
    const column = shown[variables.status];
    const stillThere = (id: string | null) => id === null || column.some((card) => card.id === id);
    const byHand = variables.byHand && stillThere(variables.byHand.afterId) && stillThere(variables.byHand.beforeId) ? variables.byHand : null;
    send({ ticket, status: variables.status, byHand });
  }

  return (
    <div className="flex flex-col gap-4">
      {problem && <MoveNotice floating problem={problem} onRetry={() => retry(problem)} onDismiss={() => setProblem(null)} />}
      <DndContext
        sensors={sensors}
        collisionDetection={collisions}
        onDragStart={onDragStart}
        onDragMove={follow}
        onDragOver={follow}
        onDragEnd={onDragEnd}
        onDragCancel={onDragCancel}
        accessibility={{ announcements, screenReaderInstructions }}
      >
        {/* Side by side from tablet width; stacked as sections on a phone. */}
        <div ref={boardRef} className="grid gap-4 md:grid-cols-4 md:gap-3 xl:gap-4">
          {REPAIR_STATUSES.map((status) => (
            <RepairColumn
              key={status}
              status={status}
              cards={shown[status]}
              facts={facts}
              activeId={activeId}
              landing={landing}
              canDrag={canWork}
              savingIds={savingIds}
              emptyText={EMPTY_TEXT[status]}
            />
          ))}
        </div>
        <DragOverlay dropAnimation={reducedMotion ? null : undefined}>
          {active && (
            // A picture of the card under the finger; the card itself stays in the list for assistive technology.
            // Lifted by its shadow and outline, not tilted: a tilt widens the box the keyboard moves by,
            // and the next column's cards would no longer all lie to its right.
            <div aria-hidden="true" className="rounded-xl shadow-2xl ring-4 ring-accent">
              <RepairCard ticket={active} facts={facts} handle={<DragHandle label={`Move ${ticketName(active.title)}`} tabIndex={-1} aria-hidden="true" />} />
            </div>
          )}
        </DragOverlay>
      </DndContext>
    </div>
  );
}
