import { useState, type FormEvent } from 'react';
import { closestCenter, DndContext, type Announcements, type DragEndEvent, type Modifier, type UniqueIdentifier } from '@dnd-kit/core';
import { arrayMove, SortableContext, useSortable, verticalListSortingStrategy } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import { SUBSYSTEM_LABEL_MAX, SUBSYSTEMS_MAX, subsystemsSchema, type SubsystemsJson } from '@shared/schemas/repairs';
import { TrashIcon } from '../../../components/ui/action-icons';
import { Button, LinkButton } from '../../../components/ui/button';
import { DragHandle } from '../../../components/ui/drag-handle';
import { useDragSensors } from '../../../components/ui/drag-sensors';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { controlClass } from '../../../components/ui/field';
import { PlusIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { StaleNotice } from '../../../components/ui/stale-notice';
import { isApiError } from '../../../lib/api-client';
import { newId } from '../../../lib/new-id';
import { useSubsystems } from '../api/get-subsystems';
import { staleSubsystems, useUpdateSubsystems } from '../api/update-subsystems';

interface Row {
  /** Local identity for the list and dragging; a saved subsystem also has its `key`. */
  rowId: string;
  key?: string;
  label: string;
}

const rowsOf = (list: SubsystemsJson): Row[] => list.subsystems.map((subsystem) => ({ rowId: subsystem.key, key: subsystem.key, label: subsystem.label }));
const rowName = (row: Row | undefined) => (row?.label.trim() ? `‘${row.label.trim()}’` : 'the new subsystem');
const alongTheList: Modifier = ({ transform }) => ({ ...transform, x: 0 });

function SubsystemRow({ row, position, error, autoFocus, onChange, onRemove }: {
  row: Row;
  position: number;
  error?: string;
  autoFocus: boolean;
  onChange: (label: string) => void;
  onRemove: () => void;
}) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({ id: row.rowId });
  const inputId = `subsystem-${row.rowId}`;
  return (
    <li
      ref={setNodeRef}
      style={{ transform: CSS.Translate.toString(transform), transition }}
      className={`flex flex-col gap-1 rounded-2xl border-2 bg-surface p-2 ${isDragging ? 'relative z-10 border-accent shadow-lg' : error ? 'border-danger' : 'border-line'}`}
    >
      <div className="flex items-center gap-2">
        <DragHandle ref={setActivatorNodeRef} label={`Move ${rowName(row)}`} {...attributes} {...listeners} />
        <label htmlFor={inputId} className="sr-only">
          Subsystem {position}
        </label>
        <input
          id={inputId}
          className={`${controlClass} min-w-0 flex-1`}
          maxLength={SUBSYSTEM_LABEL_MAX}
          value={row.label}
          autoFocus={autoFocus}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${inputId}-error` : undefined}
          onChange={(event) => onChange(event.target.value)}
        />
        <Button variant="secondary" className="px-3" onClick={onRemove} icon={<TrashIcon className="size-5" />}>
          <span className="max-sm:sr-only">Remove</span>
          <span className="sr-only"> {rowName(row)}</span>
        </Button>
      </div>
      {error && (
        <p id={`${inputId}-error`} className="pl-14 font-semibold text-danger">
          {error}
        </p>
      )}
    </li>
  );
}

/** Row messages by row, from the schema's or the server's `subsystems.<n>.label` paths, placed by the order sent. */
function rowErrors(fields: Record<string, string>, rows: readonly Row[]): { byRow: Record<string, string>; list: string | null } {
  const byRow: Record<string, string> = {};
  let list: string | null = null;
  for (const [path, message] of Object.entries(fields)) {
    const match = /^subsystems\.(\d+)/.exec(path);
    const row = match ? rows[Number(match[1])] : undefined;
    if (row) byRow[row.rowId] ??= message;
    else list ??= message;
  }
  return { byRow, list };
}

function SubsystemsForm({ saved }: { saved: SubsystemsJson }) {
  const sensors = useDragSensors();
  const update = useUpdateSubsystems();
  const [base, setBase] = useState(saved);
  const [rows, setRows] = useState<Row[]>(() => rowsOf(saved));
  const [sentRows, setSentRows] = useState<Row[]>([]);
  const [clientFields, setClientFields] = useState<Record<string, string>>({});
  const [added, setAdded] = useState<string | null>(null);
  const [savedNote, setSavedNote] = useState(false);
  const theirs = staleSubsystems(update.error);
  const serverFields = isApiError(update.error) && !theirs ? update.error.fields : {};
  const errors = rowErrors({ ...clientFields, ...serverFields }, sentRows);

  const indexOf = (id: UniqueIdentifier) => rows.findIndex((row) => row.rowId === id);
  const at = (id: UniqueIdentifier) => `position ${indexOf(id) + 1} of ${rows.length}`;
  const announcements: Announcements = {
    onDragStart: ({ active }) => `Picked up ${rowName(rows[indexOf(active.id)])}, at ${at(active.id)}.`,
    onDragOver: ({ active, over }) => (over && over.id !== active.id ? `${rowName(rows[indexOf(active.id)])} would go to ${at(over.id)}.` : undefined),
    onDragEnd: ({ active, over }) => `Moved ${rowName(rows[indexOf(active.id)])} to ${at(over?.id ?? active.id)}.`,
    onDragCancel: ({ active }) => `Move cancelled. ${rowName(rows[indexOf(active.id)])} stays at ${at(active.id)}.`,
  };

  function change(next: Row[]) {
    setSavedNote(false);
    setRows(next);
  }

  function onDragEnd({ active, over }: DragEndEvent) {
    if (over && over.id !== active.id) change(arrayMove(rows, indexOf(active.id), indexOf(over.id)));
  }

  function save(version: number) {
    const body = { version, subsystems: rows.map((row) => (row.key ? { key: row.key, label: row.label } : { label: row.label })) };
    const parsed = subsystemsSchema.safeParse(body);
    setSentRows(rows);
    if (!parsed.success) {
      setClientFields(Object.fromEntries(parsed.error.issues.map((issue) => [issue.path.join('.'), issue.message])));
      return;
    }
    setClientFields({});
    update.mutate(parsed.data, {
      onSuccess: (answer) => {
        setBase(answer);
        setRows(rowsOf(answer));
        setSavedNote(true);
      },
    });
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    save(base.version);
  }

  function takeTheirs(latest: SubsystemsJson) {
    update.reset();
    setBase(latest);
    setRows(rowsOf(latest));
    setClientFields({});
  }

  const problem = update.error && !theirs && Object.keys(serverFields).length === 0 ? update.error : null;
  return (
    <form noValidate onSubmit={submit} className="flex max-w-2xl flex-col gap-4">
      <DndContext sensors={sensors} collisionDetection={closestCenter} modifiers={[alongTheList]} onDragEnd={onDragEnd} accessibility={{ announcements }}>
        <SortableContext items={rows.map((row) => row.rowId)} strategy={verticalListSortingStrategy}>
          <ol className="flex flex-col gap-2" aria-label="Subsystems">
            {rows.map((row, index) => (
              <SubsystemRow
                key={row.rowId}
                row={row}
                position={index + 1}
                error={errors.byRow[row.rowId]}
                autoFocus={row.rowId === added}
                onChange={(label) => change(rows.map((other) => (other.rowId === row.rowId ? { ...other, label } : other)))}
                onRemove={() => change(rows.filter((other) => other.rowId !== row.rowId))}
              />
            ))}
          </ol>
        </SortableContext>
      </DndContext>
      {errors.list && <p className="font-semibold text-danger">{errors.list}</p>}
      {rows.length < SUBSYSTEMS_MAX && (
        <Button
          variant="secondary"
          icon={<PlusIcon />}
          className="self-start"
          onClick={() => {
            const row = { rowId: newId(), label: '' };
            setAdded(row.rowId);
            change([...rows, row]);
          }}
        >
          Add a subsystem
        </Button>
      )}
      <p className="text-ink-muted">A subsystem taken off the list stays on the tickets that name it; new tickets cannot pick it.</p>
      {theirs && (
        <StaleNotice
          what="the subsystem list"
          intro="They saved this list while you were editing. Your list is still above; Keep mine saves it as it is."
          pending={update.isPending}
          onKeepMine={() => save(theirs.version)}
          onTakeTheirs={() => takeTheirs(theirs)}
          keepMineLabel="Keep mine"
          takeTheirsLabel="Use theirs"
        >
          <p className="rounded-lg bg-surface p-3">{theirs.subsystems.map((subsystem) => subsystem.label).join(', ')}</p>
        </StaleNotice>
      )}
      {problem && <ErrorNotice title="Not saved" error={problem} />}
      {savedNote && (
        <p role="status" className="font-semibold text-ok">
          Saved.
        </p>
      )}
      {!theirs && (
        <div className="flex flex-wrap gap-3">
          <Button type="submit" size="lg" pending={update.isPending}>
            Save the list
          </Button>
          <LinkButton to="/repairs" variant="secondary" size="lg">
            Back to repairs
          </LinkButton>
        </div>
      )}
    </form>
  );
}

/** The team's subsystem list for leads and mentors: rename, add, remove, reorder (route guarded by repairs:manage). */
export function SubsystemsPage() {
  const subsystems = useSubsystems();
  return (
    <>
      <PageHeader title="Subsystems" description="The parts of the robot a problem is filed under, in the order the report form shows them." />
      {subsystems.isPending && <Loading label="Loading the subsystems" />}
      {subsystems.isError && <ErrorNotice title="Could not load the subsystems" error={subsystems.error} onRetry={() => subsystems.refetch()} retrying={subsystems.isFetching} />}
      {/* Mounted once with the list loaded: a lead's save on another tablet must not wipe this edit (a save shows theirs). */}
      {subsystems.isSuccess && <SubsystemsForm saved={subsystems.data} />}
    </>
  );
}
