import type { RepairSeverity, RepairStatus, RepairUrgency } from '@shared/domain/repair-urgency';
import { formatMinutes } from '../../../lib/match-labels';

export const STATUS_LABELS: Record<RepairStatus, string> = {
  reported: 'Reported',
  in_progress: 'In progress',
  needs_test: 'Needs test',
  done: 'Done',
};

export const SEVERITY_WORDS: Record<RepairSeverity, string> = {
  blocks_match: 'Blocks match',
  degraded: 'Degraded',
  cosmetic: 'Cosmetic',
};

/** What each severity means, in the words the crew decides by. */
export const SEVERITY_HELP: Record<RepairSeverity, string> = {
  blocks_match: 'The robot cannot play its next match like this.',
  degraded: 'It can play, but worse. Fix it when there is time.',
  cosmetic: 'Looks only. Nothing changes on the field.',
};

export type UrgencyTone = 'danger' | 'warning' | 'neutral';

/**
 * Minutes left to the queue call as the card says them: "18 min to queue", "Late — cannot make
 * the queue" (a blocking ticket whose work left is longer than the time left, or past the call),
 * "Queue call passed". Null for a done ticket, which needs nothing any more.
 */
export function urgencyWords(urgency: RepairUrgency, severity: RepairSeverity, done: boolean): { text: string; tone: UrgencyTone } | null {
  if (done) return null;
  if (urgency.minutesLeft === null) return { text: 'No queue call ahead', tone: 'neutral' };
  if (urgency.late) return { text: 'Late — cannot make the queue', tone: 'danger' };
  if (urgency.minutesLeft < 0) return { text: 'Queue call passed', tone: 'warning' };
  // A blocking ticket under ten minutes from the call is the pit's business now.
  const tone = severity === 'blocks_match' && urgency.minutesLeft <= 10 ? 'warning' : 'neutral';
  return { text: `${formatMinutes(urgency.minutesLeft)} to queue`, tone };
}

/** "about 20 min of work left", when someone has estimated it. */
export function workLeftWords(urgency: RepairUrgency): string | null {
  return urgency.remainingMinutes === null ? null : `about ${formatMinutes(urgency.remainingMinutes)} of work left`;
}

/** ‘Arm chain off’: how buttons and announcements name a ticket. */
export const ticketName = (title: string) => `‘${title}’`;
