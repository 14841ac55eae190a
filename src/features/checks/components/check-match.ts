import type { Alliance, MatchLevel } from '@shared/domain/timeline';

/** One of our matches as the Checks area needs it; the route takes it from the schedule's timeline. */
export interface CheckMatch {
  id: string;
  level: MatchLevel;
  number: number;
  alliance: Alliance | null;
  /** On the field already (a post-match check belongs to the last of these). */
  started: boolean;
  /** When to queue; null once the match has started. */
  queueAt: string | null;
}
