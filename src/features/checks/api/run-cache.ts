import type { Mutation, QueryClient } from '@tanstack/react-query';
import { evaluateMark, isComplete, progressOf, type MarkValue } from '@shared/domain/checklist';
import type { PersonJson, RunItemJson, RunJson } from '@shared/schemas/checks';
import { serverNow } from '../../../lib/server-clock';

/**
 * A run in the cache is the server's answer with this tablet's own marks still on their way laid
 * over it: a tick shows at once, and a refetch (another tablet's mark announced meanwhile) does
 * not take it off the screen until the server has answered.
 */

export const runQueryKey = (runId: string) => ['checklist-run', runId] as const;

/** Marks and un-marks of one run share this key: the overlay and "last one settled" find them by it. */
export const marksMutationKey = (runId: string) => ['checklist-marks', runId] as const;

/** Marks of one item go out one after another, so a tick then an un-tick land in that order. */
export const itemScope = (runId: string, itemId: string) => ({ id: `checklist-mark:${runId}:${itemId}` });

/** What a mark's `onMutate` leaves for rollback and for the overlay. */
export interface MarkContext {
  itemId: string;
  previous: RunItemJson;
  optimistic: RunItemJson;
  /** The server's answer, once in (the mutation still counts as pending while its callbacks run). */
  confirmed?: RunItemJson;
}

/** The run with one item replaced, its progress and completeness counted again. */
export function withItem(run: RunJson, item: RunItemJson): RunJson {
  const items = run.items.map((current) => (current.id === item.id ? item : current));
  const progress = progressOf(items);
  return { ...run, items, progress, complete: isComplete(progress) };
}

/** The item as a mark (or, with null, an un-mark) will leave it, before the server confirms. */
export function markedItem(item: RunItemJson, value: MarkValue | null, by: PersonJson, note: string | null = null): RunItemJson {
  if (value === null) return { ...item, value: null, note: null, done: false, failed: false, markedBy: null, markedAt: null };
  return { ...item, value, note, ...evaluateMark(item, value), markedBy: by, markedAt: serverNow().toISOString() };
}

type MarkMutation = Mutation<RunItemJson, Error, unknown, MarkContext>;

/** This tablet's marks of the run that have not settled yet, oldest first. */
function pendingMarks(client: QueryClient, runId: string): MarkMutation[] {
  return client.getMutationCache().findAll({ mutationKey: marksMutationKey(runId), status: 'pending' }) as MarkMutation[];
}

/**
 * Lays this tablet's marks still on their way over a run from the server (their answer once in,
 * else the optimistic item). A settled mark is not laid over: every mark refetches the run once
 * it settles (see below), and that answer already holds it, or a later write that won.
 */
export function withOwnMarks(run: RunJson, client: QueryClient): RunJson {
  let result = run;
  for (const mutation of pendingMarks(client, run.id)) {
    const item = mutation.state.context?.confirmed ?? mutation.state.context?.optimistic;
    if (item && result.items.some((current) => current.id === item.id)) result = withItem(result, item);
  }
  return result;
}

/**
 * The optimistic half of a mark or un-mark: show it at once, keep the server's answer, roll back
 * a refusal (the item goes back to what it was), then read the run again. That read starts after
 * the write, so it replaces any read begun before it and shows the last write of the item, ours
 * or another tablet's: every tablet ends on the value the server kept.
 */
export function optimisticMarkHandlers<V>(
  queryClient: QueryClient,
  runId: string,
  itemId: string,
  toItem: (item: RunItemJson, variables: V) => RunItemJson,
) {
  const key = runQueryKey(runId);
  return {
    onMutate: (variables: V): MarkContext | undefined => {
      const run = queryClient.getQueryData<RunJson>(key);
      const previous = run?.items.find((item) => item.id === itemId);
      if (!run || !previous) return undefined;
      const optimistic = toItem(previous, variables);
      queryClient.setQueryData<RunJson>(key, withItem(run, optimistic));
      return { itemId, previous, optimistic };
    },
    onSuccess: (item: RunItemJson, _variables: V, context: MarkContext | undefined) => {
      if (context) context.confirmed = item;
      queryClient.setQueryData<RunJson>(key, (run) => run && withItem(run, item));
    },
    onError: (_error: Error, _variables: V, context: MarkContext | undefined) => {
      if (context) queryClient.setQueryData<RunJson>(key, (run) => run && withItem(run, context.previous));
    },
    onSettled: () => {
      // Cancels a read still on its way (it may predate this write) and starts a fresh one.
      void queryClient.invalidateQueries({ queryKey: key });
      // This mark still counts as pending while its callbacks run: 1 means it is the last one.
      if (queryClient.isMutating({ mutationKey: marksMutationKey(runId) }) > 1) return;
      // Lists and readiness only once a burst of ticks is over; a read already on its way is kept.
      void queryClient.invalidateQueries({ queryKey: ['checklist-runs'] }, { cancelRefetch: false });
      void queryClient.invalidateQueries({ queryKey: ['readiness'] }, { cancelRefetch: false });
    },
  };
}
