/**
 * Match readiness (DESIGN §4.4): is the robot ready for one of our matches, and if not, why.
 *
 * The answer is built from facts the server gathers (the pre-match runs of the match, and, once
 * those areas track them, the battery installed and the repairs that block the match). Each rule
 * reads the facts and gives reasons; the state is the worst level among them. A fact an area
 * does not track yet is left out (`undefined`), and its rule then says nothing: the battery and
 * repair areas add their facts in the server's gatherer, and no caller changes.
 */
import type { ItemPurpose, MarkValue } from './checklist';
import { describeLimits } from './checklist';
import type { Alliance } from './timeline';

export type ReadinessState = 'ready' | 'at_risk' | 'not_ready';
export type ReasonLevel = Exclude<ReadinessState, 'ready'>;

export interface ReadinessReason {
  code: ReasonCode;
  message: string;
  level: ReasonLevel;
}

export interface ReadinessJson {
  matchId: string;
  state: ReadinessState;
  /** Worst first. Empty when ready. */
  reasons: ReadinessReason[];
}

export type ReasonCode =
  | 'checklist_missing'
  | 'checklist_incomplete'
  | 'out_of_limits'
  | 'advisory_open'
  | 'signed_off_incomplete'
  | 'bumper_unconfirmed'
  | 'bumper_mismatch'
  | 'battery_not_installed'
  | 'battery_low'
  | 'battery_charge_unknown'
  | 'repair_blocks_match'
  | 'queue_call_near'
  | 'queue_call_passed';

/** What readiness reads of a run item; a run answer's item fits as it is. */
export interface ReadinessItem {
  label: string;
  required: boolean;
  done: boolean;
  failed: boolean;
  value: MarkValue | null;
  purpose: ItemPurpose | null;
  min: number | null;
  max: number | null;
  unit: string | null;
  /** When the current mark was made; null when unmarked. */
  markedAt: string | null;
}

export interface ReadinessRun {
  name: string;
  items: readonly ReadinessItem[];
  signOff: { at: string; reason: string | null } | null;
}

export interface ReadinessFacts {
  match: { id: string; alliance: Alliance | null; queueAt: string | null };
  /** The pre-match runs started for this match. */
  preMatchRuns: readonly ReadinessRun[];
  /** Left out until the battery area tracks it; `installed: null` when none is in the robot. */
  battery?: { installed: { label: string; stateOfChargePercent: number | null } | null; minimumChargePercent: number };
  /**
   * Left out until the repair area tracks it: open tickets that block the match; `late` when one
   * cannot make the queue call (see repair urgency).
   */
  blockingRepairs?: readonly { id: string; title: string; late: boolean }[];
}

/** Under this long before the queue call, open required work puts the match at risk loudly. */
export const QUEUE_NEAR_MS = 5 * 60_000;

/**
 * `pending`: work still to do before the queue call, `at_risk` until the call and `not_ready`
 * once it has passed. A fault (a number out of limits, the wrong bumpers) is `not_ready` at once.
 */
type RuleLevel = ReasonLevel | 'pending';
type RuleReason = Omit<ReadinessReason, 'level'> & { level: RuleLevel };
export type ReadinessRule = (facts: ReadinessFacts) => RuleReason[];

const LIST_AT_MOST = 3;

/** "Main breaker on, Radio secured and 2 more": names a few, counts the rest. */
function listLabels(labels: readonly string[]): string {
  if (labels.length <= LIST_AT_MOST) return labels.join(', ');
  return `${labels.slice(0, LIST_AT_MOST).join(', ')} and ${labels.length - LIST_AT_MOST} more`;
}

const plural = (count: number, one: string, many: string) => `${count} ${count === 1 ? one : many}`;

const isBumperItem = (item: ReadinessItem) => item.purpose === 'bumper_colour';

/**
 * A sign-off excuses only what the lead saw open and gave a reason for. One without a reason was
 * given to a complete run, so whatever is open now was un-marked after it; and a mark made after
 * the sign-off (a pressure read again and found low) is news the lead has not seen.
 */
const isExcused = ({ signOff }: ReadinessRun, item: ReadinessItem) =>
  signOff !== null && signOff.reason !== null && (item.markedAt === null || Date.parse(item.markedAt) <= Date.parse(signOff.at));

function checklistReasons(facts: ReadinessFacts): RuleReason[] {
  if (facts.preMatchRuns.length === 0) {
    return [{ code: 'checklist_missing', level: 'pending', message: 'No pre-match check has been started for this match' }];
  }
  const reasons: RuleReason[] = [];
  for (const run of facts.preMatchRuns) {
    // The bumper item has its own rule: its message says which colour is needed.
    const items = run.items.filter((item) => !isBumperItem(item));
    const notDone = [...items.filter((item) => item.failed), ...items.filter((item) => item.required && !item.done && !item.failed)];
    const excused = notDone.filter((item) => isExcused(run, item));
    const failed = notDone.filter((item) => item.failed && !excused.includes(item));
    const openRequired = notDone.filter((item) => !item.failed && !excused.includes(item));
    const openAdvisory = items.filter((item) => !item.required && !item.done && !item.failed);
    if (excused.length > 0) {
      const open = excused.map((item) => item.label);
      reasons.push({
        code: 'signed_off_incomplete',
        level: 'at_risk',
        message: `${run.name} was signed off by a lead with ${plural(open.length, 'item', 'items')} not done (${listLabels(open)}): “${run.signOff?.reason}”`,
      });
    }
    for (const item of failed) {
      const limits = describeLimits(item);
      reasons.push({
        code: 'out_of_limits',
        level: 'not_ready',
        message: `${item.label}: ${String(item.value)}${item.unit ? ` ${item.unit}` : ''} is outside the limits${limits ? ` (${limits})` : ''}`,
      });
    }
    if (openRequired.length > 0) {
      reasons.push({
        code: 'checklist_incomplete',
        level: 'pending',
        message: `${run.name}: ${plural(openRequired.length, 'required item', 'required items')} open (${listLabels(openRequired.map((item) => item.label))})`,
      });
    }
    if (openAdvisory.length > 0) {
      reasons.push({
        code: 'advisory_open',
        level: 'at_risk',
        message: `${run.name}: ${plural(openAdvisory.length, 'optional item', 'optional items')} open (${listLabels(openAdvisory.map((item) => item.label))})`,
      });
    }
  }
  return reasons;
}

function bumperReasons(facts: ReadinessFacts): RuleReason[] {
  const alliance = facts.match.alliance;
  if (alliance === null) return [];
  const word = alliance.toUpperCase();
  const bumperItems = facts.preMatchRuns.flatMap((run) => run.items.filter(isBumperItem));
  const reasons: RuleReason[] = [];
  for (const item of bumperItems) {
    if (item.value === null) {
      reasons.push({ code: 'bumper_unconfirmed', level: 'pending', message: `Bumper colour not confirmed yet: we are on the ${word} alliance` });
    } else if (String(item.value).toLowerCase() !== alliance) {
      reasons.push({
        code: 'bumper_mismatch',
        level: 'not_ready',
        message: `${String(item.value)} bumpers are marked, but we are on the ${word} alliance: change the bumpers`,
      });
    }
  }
  return reasons;
}

function batteryReasons({ battery }: ReadinessFacts): RuleReason[] {
  if (!battery) return [];
  const { installed, minimumChargePercent } = battery;
  if (!installed) return [{ code: 'battery_not_installed', level: 'pending', message: 'No battery is recorded as installed for this match' }];
  const charge = installed.stateOfChargePercent;
  if (charge === null) {
    return [{ code: 'battery_charge_unknown', level: 'at_risk', message: `Battery ${installed.label} has no reading yet: check its charge before the match` }];
  }
  if (charge < minimumChargePercent) {
    return [
      {
        code: 'battery_low',
        level: 'not_ready',
        message: `Battery ${installed.label} is at about ${Math.round(charge)} %, below the ${minimumChargePercent} % a match needs`,
      },
    ];
  }
  return [];
}

// Work still to do before the queue call, like an open check; not ready at once when it cannot make it.
function repairReasons({ blockingRepairs }: ReadinessFacts): RuleReason[] {
  return (blockingRepairs ?? []).map((repair) => ({
    code: 'repair_blocks_match' as const,
    level: repair.late ? ('not_ready' as const) : ('pending' as const),
    message: repair.late ? `Open repair blocks this match and cannot make the queue call: ${repair.title}` : `Open repair blocks this match: ${repair.title}`,
  }));
}

/** Every rule readiness applies, in the order their reasons are listed at one level. */
export const READINESS_RULES: readonly ReadinessRule[] = [checklistReasons, bumperReasons, batteryReasons, repairReasons];

const LEVEL_RANK: Record<ReasonLevel, number> = { not_ready: 0, at_risk: 1 };

/** Readiness of one match at `now`. Deterministic. */
export function computeReadiness(facts: ReadinessFacts, now: Date, rules: readonly ReadinessRule[] = READINESS_RULES): ReadinessJson {
  const found = rules.flatMap((rule) => rule(facts));
  const queueInMs = facts.match.queueAt === null ? null : Date.parse(facts.match.queueAt) - now.getTime();
  const queuePassed = queueInMs !== null && queueInMs <= 0;
  const pending = found.filter((reason) => reason.level === 'pending').length;

  const reasons: ReadinessReason[] = found.map((reason) => ({
    ...reason,
    level: reason.level === 'pending' ? (queuePassed ? 'not_ready' : 'at_risk') : reason.level,
  }));
  if (pending > 0 && queueInMs !== null) {
    if (queuePassed) {
      const ago = Math.floor(-queueInMs / 60_000);
      const when = ago === 0 ? 'The queue call is now' : `The queue call was ${ago} min ago`;
      reasons.push({ code: 'queue_call_passed', level: 'not_ready', message: `${when} and required work is still open` });
    } else if (queueInMs < QUEUE_NEAR_MS) {
      const minutes = Math.ceil(queueInMs / 60_000);
      reasons.push({ code: 'queue_call_near', level: 'at_risk', message: `Queue call in ${minutes} min and required work is still open` });
    }
  }
  // Stable: reasons of one level keep the order of the rules.
  reasons.sort((a, b) => LEVEL_RANK[a.level] - LEVEL_RANK[b.level]);
  const state: ReadinessState = reasons.length === 0 ? 'ready' : reasons[0].level;
  return { matchId: facts.match.id, state, reasons };
}
