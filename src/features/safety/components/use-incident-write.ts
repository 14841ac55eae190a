import { useState } from 'react';
import type { IncidentJson } from '@shared/schemas/incidents';
import { staleIncident } from '../api/incidents-cache';
import { useUpdateIncident, type IncidentChanges } from '../api/update-incident';

/**
 * One change a person asks for on the report page, written against whichever version it is applied
 * to: "tick this follow-up" on their newer list still ticks only that one.
 */
export interface IncidentEdit {
  /** The form that asked, so that form shows the answer's errors. */
  form: string;
  /** What the person asked for, in words that follow "Your change:", e.g. "tick ‘Replace the bench fan’". */
  what: string;
  apply: (incident: IncidentJson) => Omit<IncidentChanges, 'version'>;
  /**
   * Whether a version already holds the change: after a lost answer, the page (refreshed by the
   * socket) or a stale answer shows the first send went through, and sending it again would
   * repeat it (a second follow-up) or report its own save as someone else's.
   */
  isIn?: (incident: IncidentJson) => boolean;
  onSaved?: () => void;
  /** After the answer, whatever it was (a tick shown at once goes back to what the page has). */
  onSettled?: () => void;
  /** "Use theirs" dropped it. */
  onDropped?: () => void;
}

export interface Conflict {
  edit: IncidentEdit;
  /** The version the edit was made on, and the one someone else saved meanwhile. */
  base: IncidentJson;
  theirs: IncidentJson;
}

/**
 * Writes edits with the version they were based on. A 409 stale keeps the edit aside with their
 * version: "keep mine" applies it again on theirs, "use theirs" drops it.
 */
export function useIncidentWrite(incident: IncidentJson) {
  const update = useUpdateIncident(incident.id);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const [active, setActive] = useState<IncidentEdit | null>(null);

  function saved(edit: IncidentEdit) {
    setConflict(null);
    update.reset();
    edit.onSaved?.();
  }

  function send(edit: IncidentEdit, on: IncidentJson) {
    setActive(edit);
    if (edit.isIn?.(on)) {
      saved(edit);
      return edit.onSettled?.();
    }
    update.mutate(
      { ...edit.apply(on), version: on.version },
      {
        onSuccess: () => {
          setConflict(null);
          edit.onSaved?.();
        },
        onError: (error) => {
          const theirs = staleIncident(error);
          if (theirs && edit.isIn?.(theirs)) return saved(edit);
          setConflict(theirs ? { edit, base: on, theirs } : null);
        },
        onSettled: edit.onSettled,
      },
    );
  }

  return {
    /** Writes on the version given, by default the one on the page now. */
    write: (edit: IncidentEdit, on: IncidentJson = incident) => send(edit, on),
    conflict,
    keepMine: () => conflict && send(conflict.edit, conflict.theirs),
    takeTheirs: () => {
      conflict?.edit.onDropped?.();
      setConflict(null);
      update.reset();
    },
    /** One write at a time: a second one would be based on the version the first is about to replace. */
    pending: update.isPending,
    /** Whether this form's edit is on its way. */
    pendingFor: (form: string) => update.isPending && active?.form === form,
    /** The last answer's error when it was this form's edit (a stale answer is the conflict's, not an error). */
    errorFor: (form: string) => (active?.form === form && !staleIncident(update.error) ? update.error : null),
  };
}

export type IncidentWriter = ReturnType<typeof useIncidentWrite>;
