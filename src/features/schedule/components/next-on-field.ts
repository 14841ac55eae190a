import type { TimelineMatchJson } from '@shared/domain/timeline';

/**
 * The match the field takes next: the first unstarted one after the last started. A match the
 * field skipped (or someone forgot to mark) is not offered again; it can still be read above.
 */
export function nextOnField(matches: readonly TimelineMatchJson[]): TimelineMatchJson | null {
  let lastStarted = -1;
  matches.forEach((match, index) => {
    if (match.startedAt !== null) lastStarted = index;
  });
  return matches.slice(lastStarted + 1).find((match) => match.startedAt === null) ?? null;
}
