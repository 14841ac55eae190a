import type { Transaction } from 'sequelize';
import type { RepairSeverity, RepairStatus } from '../../../shared/domain/repair-urgency';
import type { Role } from '../../../shared/roles';
import { Repair, RepairChange, type Event, type User } from '../../models';
import type { ChangeSet } from '../../models/repair-change';
import { nextQueueOf } from '../../repairs/next-queue';
import { columnOf, keyForSlot, urgencySlot } from '../../repairs/placement';
import type { DemoChecklistMatch } from './demo-checklists';

/**
 * The demo team's repair board, in invented words: a blocking belt being fixed now (its estimate
 * fits before the next queue call), a slipping intake roller and a torn bumper just reported, a
 * limit switch waiting for a test, and an arm bolt fixed this morning with its parts and note.
 * Each ticket has the history the API would have written; no photos.
 */
interface DemoRepair {
  title: string;
  description: string | null;
  subsystem: string;
  severity: RepairSeverity;
  status: RepairStatus;
  reporter: Role;
  assignee: Role | null;
  /** Found in our n-th played match counted back from the last (0 = the last); null when found in the pit. */
  foundInPlayed: number | null;
  /** Minutes after that match started it was reported; when found in the pit, minutes from now (negative). */
  reportedAfterMinutes: number;
  estimateMinutes: number | null;
  timeSpentMinutes: number;
  partsUsed: string[];
  resolutionNote: string | null;
}

const MINUTE_MS = 60_000;
const shift = (at: Date, minutes: number) => new Date(at.getTime() + minutes * MINUTE_MS);
const notAfter = (limit: Date, at: Date) => (at > limit ? limit : at);

/** Time already spent on the blocking belt; its estimate is set so that the rest fits the queue call. */
const BELT_SPENT_MINUTES = 12;

const BOARD: readonly DemoRepair[] = [
  {
    title: 'Arm pivot bolt backing out',
    description: 'The arm droops a few degrees at full reach; the pivot bolt turns by hand.',
    subsystem: 'arm',
    severity: 'blocks_match',
    status: 'done',
    reporter: 'crew',
    assignee: 'crew',
    foundInPlayed: 2,
    reportedAfterMinutes: 9,
    estimateMinutes: 20,
    timeSpentMinutes: 18,
    partsUsed: ['M6 × 40 socket head bolt', 'Nylon lock nut', 'Thread locker (blue)'],
    resolutionNote: 'Swapped for a longer bolt with a lock nut and thread locker; torque-marked so the walk-around shows if it turns again.',
  },
  {
    title: 'Elevator limit switch reads open when shaken',
    description: 'The carriage stopped short twice in the practice match; the switch lever is loose.',
    subsystem: 'electrical',
    severity: 'degraded',
    status: 'needs_test',
    reporter: 'lead',
    assignee: 'lead',
    foundInPlayed: 1,
    reportedAfterMinutes: 8,
    estimateMinutes: 30,
    timeSpentMinutes: 25,
    partsUsed: ['Limit switch (spare from the cart)'],
    resolutionNote: null,
  },
  {
    title: 'Left drive belt skipping teeth',
    description: 'Clicks once a wheel turn under load; the tensioner has slid in its slot.',
    subsystem: 'drivetrain',
    severity: 'blocks_match',
    status: 'in_progress',
    reporter: 'crew',
    assignee: 'crew',
    foundInPlayed: 0,
    reportedAfterMinutes: 8,
    estimateMinutes: null,
    timeSpentMinutes: BELT_SPENT_MINUTES,
    partsUsed: [],
    resolutionNote: null,
  },
  {
    title: 'Intake roller slipping on its hub',
    description: null,
    subsystem: 'intake',
    severity: 'degraded',
    status: 'reported',
    reporter: 'lead',
    assignee: null,
    foundInPlayed: 0,
    reportedAfterMinutes: 10,
    estimateMinutes: 15,
    timeSpentMinutes: 0,
    partsUsed: [],
    resolutionNote: null,
  },
  {
    title: 'Bumper fabric torn at the back corner',
    description: 'About a hand wide; the number is still readable.',
    subsystem: 'bumpers',
    severity: 'cosmetic',
    status: 'reported',
    reporter: 'crew',
    assignee: null,
    foundInPlayed: null,
    reportedAfterMinutes: -6,
    estimateMinutes: null,
    timeSpentMinutes: 0,
    partsUsed: [],
    resolutionNote: null,
  },
];

export async function seedDemoRepairs(
  { event, users, matches, now }: { event: Event; users: Record<Role, User>; matches: readonly DemoChecklistMatch[]; now: Date },
  transaction: Transaction,
) {
  const played = matches.filter((match) => match.alliance !== null && match.startedAt !== null);
  const nextQueue = await nextQueueOf(event, now, transaction);
  // The belt's work left fits before the next queue call (a few minutes at most in the demo).
  const minutesLeft = nextQueue ? Math.floor((Date.parse(nextQueue.queueAt) - now.getTime()) / MINUTE_MS) : 10;
  const beltEstimate = BELT_SPENT_MINUTES + Math.max(1, Math.min(10, minutesLeft - 1));

  for (const demo of BOARD) {
    const found = demo.foundInPlayed === null ? undefined : played.at(-1 - demo.foundInPlayed);
    const reportedAt = notAfter(now, shift(found?.startedAt ?? now, demo.reportedAfterMinutes));
    const estimateMinutes = demo.title === 'Left drive belt skipping teeth' ? beltEstimate : demo.estimateMinutes;
    const ticket = { severity: demo.severity, status: demo.status, estimateMinutes, timeSpentMinutes: demo.timeSpentMinutes };
    const column = await columnOf(event.id, demo.status, null, transaction);
    const { orderKey } = await keyForSlot(column, urgencySlot(column, { id: '', ...ticket, reportedAt: reportedAt.toISOString() }), transaction);
    const assigneeId = demo.assignee ? users[demo.assignee].id : null;
    const lastChangeAt = demo.status === 'reported' ? reportedAt : notAfter(now, shift(reportedAt, Math.max(5, demo.timeSpentMinutes)));
    const repair = await Repair.create(
      {
        eventId: event.id,
        title: demo.title,
        description: demo.description,
        subsystem: demo.subsystem,
        ...ticket,
        orderKey,
        placedByHand: false,
        foundInMatchId: found?.id ?? null,
        reporterId: users[demo.reporter].id,
        assigneeId,
        partsUsed: demo.partsUsed,
        resolutionNote: demo.resolutionNote,
        doneAt: demo.status === 'done' ? lastChangeAt : null,
        createdAt: reportedAt,
        updatedAt: lastChangeAt,
      },
      { transaction, silent: true },
    );

    // The history the API would have written for these steps: reported, picked up, moved on, closed.
    const rows: { kind: RepairChange['kind']; changes: ChangeSet; by: Role; at: Date }[] = [];
    const reported: ChangeSet = { title: [null, demo.title], subsystem: [null, demo.subsystem], severity: [null, demo.severity] };
    if (demo.description) reported.description = [null, demo.description];
    if (found) reported.foundInMatchId = [null, found.id];
    if (demo.estimateMinutes !== null) reported.estimateMinutes = [null, demo.estimateMinutes];
    rows.push({ kind: 'created', changes: reported, by: demo.reporter, at: reportedAt });
    if (demo.assignee) rows.push({ kind: 'assigned', changes: { assigneeId: [null, assigneeId] }, by: 'lead', at: shift(reportedAt, 1) });
    if (demo.status !== 'reported') rows.push({ kind: 'moved', changes: { status: ['reported', 'in_progress'] }, by: demo.assignee ?? 'crew', at: shift(reportedAt, 2) });
    // Picked up with a guess of how long it takes, in the same write.
    if (estimateMinutes !== demo.estimateMinutes) rows.push({ kind: 'edited', changes: { estimateMinutes: [demo.estimateMinutes, estimateMinutes] }, by: demo.assignee ?? 'crew', at: shift(reportedAt, 2) });
    if (demo.status === 'needs_test' || demo.status === 'done') {
      const work: ChangeSet = { timeSpentMinutes: [0, demo.timeSpentMinutes] };
      if (demo.partsUsed.length > 0) work.partsUsed = [[], demo.partsUsed];
      rows.push({ kind: 'moved', changes: { status: ['in_progress', 'needs_test'] }, by: demo.assignee ?? 'crew', at: shift(lastChangeAt, demo.status === 'done' ? -3 : 0) });
      rows.push({ kind: 'edited', changes: work, by: demo.assignee ?? 'crew', at: shift(lastChangeAt, demo.status === 'done' ? -3 : 0) });
    }
    if (demo.status === 'done') {
      rows.push({ kind: 'moved', changes: { status: ['needs_test', 'done'] }, by: 'lead', at: lastChangeAt });
      rows.push({ kind: 'edited', changes: { resolutionNote: [null, demo.resolutionNote] }, by: 'lead', at: lastChangeAt });
    }
    if (demo.status === 'in_progress' && demo.timeSpentMinutes > 0) {
      rows.push({ kind: 'edited', changes: { timeSpentMinutes: [0, demo.timeSpentMinutes] }, by: demo.assignee ?? 'crew', at: lastChangeAt });
    }
    await RepairChange.bulkCreate(
      rows.map(({ by, ...row }) => ({ ...row, repairId: repair.id, byId: users[by].id })),
      { transaction },
    );
  }
}
