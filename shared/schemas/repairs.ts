import { z } from 'zod';
import { REPAIR_SEVERITIES, REPAIR_STATUSES, type RepairSeverity, type RepairStatus, type RepairUrgency } from '../domain/repair-urgency';
import { clientId, requiredOr, versionField } from './common';

export const REPAIR_TITLE_MAX = 120;
export const REPAIR_DESCRIPTION_MAX = 2000;
export const REPAIR_NOTE_MAX = 2000;
export const PARTS_LINES_MAX = 30;
export const PARTS_LINE_MAX = 120;
export const REPAIR_PHOTOS_MAX = 6;
export const REPAIR_PHOTO_MAX_BYTES = 10 * 1024 * 1024;
// HEIF is the container HEIC photos come in; some cameras label theirs so.
export const REPAIR_PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp', 'image/heic', 'image/heif'] as const;
export type RepairPhotoType = (typeof REPAIR_PHOTO_TYPES)[number];
export const SUBSYSTEMS_MAX = 30;
export const SUBSYSTEM_LABEL_MAX = 40;
export const MINUTES_MAX = 7 * 24 * 60;

export const SEVERITY_MESSAGE = `One of: ${REPAIR_SEVERITIES.join(', ')}`;
export const STATUS_MESSAGE = `One of: ${REPAIR_STATUSES.join(', ')}`;

const uuid = z.uuid(requiredOr('Must be a UUID'));
const title = z
  .string(requiredOr('Say in a few words what is wrong'))
  .trim()
  .min(1, { message: 'Say in a few words what is wrong' })
  .max(REPAIR_TITLE_MAX, { message: `At most ${REPAIR_TITLE_MAX} characters` });
// An empty optional text from a form means "none".
const optionalText = (max: number) =>
  z
    .string({ message: 'Text' })
    .trim()
    .max(max, { message: `At most ${max} characters` })
    .nullish()
    .transform((value) => (value ? value : null));
const minutes = (what: string) =>
  z
    .number(requiredOr(`${what}: whole minutes from 0 to ${MINUTES_MAX}`))
    .int({ message: `${what}: whole minutes from 0 to ${MINUTES_MAX}` })
    .min(0, { message: `${what}: whole minutes from 0 to ${MINUTES_MAX}` })
    .max(MINUTES_MAX, { message: `${what}: whole minutes from 0 to ${MINUTES_MAX}` });
/** A subsystem is named by its key in the team's list (`drivetrain`, `end_effector`). */
export const subsystemKey = z
  .string(requiredOr('Pick a subsystem'))
  .trim()
  .regex(/^[a-z0-9_]{1,40}$/, { message: 'Pick a subsystem from the list' });
const severity = z.enum(REPAIR_SEVERITIES, requiredOr(SEVERITY_MESSAGE));
const status = z.enum(REPAIR_STATUSES, requiredOr(STATUS_MESSAGE));
const partsUsed = z
  .array(
    z
      .string({ message: 'A line of text' })
      .trim()
      .max(PARTS_LINE_MAX, { message: `At most ${PARTS_LINE_MAX} characters a line` }),
    { message: 'A list of lines' },
  )
  .max(PARTS_LINES_MAX, { message: `At most ${PARTS_LINES_MAX} lines` })
  .transform((lines) => lines.filter((line) => line.length > 0));

export const eventRepairsParams = z.object({ eventId: uuid });
export const repairParams = z.object({ id: uuid });
export const repairPhotoParams = z.object({ id: uuid, photoId: uuid });
export const photoSizeQuery = z.object({ size: z.enum(['full', 'thumb'], { message: 'Use full or thumb' }).optional().default('full') });

/** `POST /api/events/:eventId/repairs`; the reporter is the caller, the column `reported`. */
export const createRepairSchema = z
  .object({
    id: clientId.optional(),
    title,
    subsystem: subsystemKey,
    severity,
    description: optionalText(REPAIR_DESCRIPTION_MAX),
    foundInMatchId: uuid.nullish().transform((value) => value ?? null),
    assigneeId: uuid.nullish().transform((value) => value ?? null),
    estimateMinutes: minutes('Estimate').nullish().transform((value) => value ?? null),
  })
  .strict();
export type CreateRepairInput = z.output<typeof createRepairSchema>;

/**
 * `PATCH /api/repairs/:id`: any of the fields, always the `version` it was based on. `status`
 * moves it to another column; `afterId`/`beforeId` (null for an end of the column) place it by
 * hand, which only a lead or admin may do — without them it goes where urgency puts it.
 */
export const updateRepairSchema = z
  .object({
    version: versionField,
    status: status.optional(),
    assigneeId: uuid.nullable().optional(),
    title: title.optional(),
    description: optionalText(REPAIR_DESCRIPTION_MAX).optional(),
    severity: severity.optional(),
    subsystem: subsystemKey.optional(),
    foundInMatchId: uuid.nullable().optional(),
    afterId: uuid.nullable().optional(),
    beforeId: uuid.nullable().optional(),
    estimateMinutes: minutes('Estimate').nullable().optional(),
    timeSpentMinutes: minutes('Time spent').optional(),
    partsUsed: partsUsed.optional(),
    resolutionNote: optionalText(REPAIR_NOTE_MAX).optional(),
  })
  .strict();
export type UpdateRepairInput = z.output<typeof updateRepairSchema>;

/** `PUT /api/team/repair-subsystems`: the whole list, in order, with the version it was based on. */
export const subsystemsSchema = z
  .object({
    version: versionField,
    subsystems: z
      .array(
        z
          .object({
            key: subsystemKey.optional(),
            label: z
              .string(requiredOr('Name the subsystem'))
              .trim()
              .min(1, { message: 'Name the subsystem' })
              .max(SUBSYSTEM_LABEL_MAX, { message: `At most ${SUBSYSTEM_LABEL_MAX} characters` }),
          })
          .strict(),
        { message: 'A list of subsystems' },
      )
      .min(1, { message: 'Keep at least one subsystem' })
      .max(SUBSYSTEMS_MAX, { message: `At most ${SUBSYSTEMS_MAX} subsystems` }),
  })
  .strict();
export type SubsystemsInput = z.output<typeof subsystemsSchema>;

export interface SubsystemJson {
  key: string;
  label: string;
}
/** `GET /api/team/repair-subsystems`. */
export interface SubsystemsJson {
  subsystems: SubsystemJson[];
  version: number;
}

export interface PersonJson {
  id: string;
  displayName: string;
}

export interface RepairPhotoJson {
  id: string;
  contentType: RepairPhotoType;
  byteSize: number;
  width: number | null;
  height: number | null;
  /** False when no thumbnail could be made (a HEIC the server cannot decode): show the full photo's link. */
  hasThumb: boolean;
  uploadedBy: PersonJson;
  uploadedAt: string;
  url: string;
  thumbUrl: string | null;
}

export type RepairChangeKind = 'created' | 'moved' | 'placed' | 'assigned' | 'edited' | 'photo_added' | 'photo_removed';

/** One line of a ticket's history: who did what when; `changes` holds field → [before, after]. */
export interface RepairChangeJson {
  id: string;
  kind: RepairChangeKind;
  by: PersonJson;
  at: string;
  changes: Record<string, [unknown, unknown]>;
}

/** A ticket as every writer and reader with `repairs` detail sees it. */
export interface RepairJson {
  id: string;
  eventId: string;
  title: string;
  description: string | null;
  subsystem: string;
  severity: RepairSeverity;
  status: RepairStatus;
  /** Fractional key: the column's cards sorted by it (then id) are in board order. */
  orderKey: string;
  placedByHand: boolean;
  foundInMatchId: string | null;
  reporter: PersonJson;
  assignee: PersonJson | null;
  estimateMinutes: number | null;
  timeSpentMinutes: number;
  partsUsed: string[];
  resolutionNote: string | null;
  photoCount: number;
  /** The first photo's thumbnail for the card, if any. */
  coverThumbUrl: string | null;
  reportedAt: string;
  updatedAt: string;
  doneAt: string | null;
  urgency: RepairUrgency;
  version: number;
}

/** What a viewer reads of a ticket: its title and status, and where it sits. */
export type RepairSummaryJson = Pick<RepairJson, 'id' | 'eventId' | 'title' | 'status' | 'orderKey' | 'version'>;

/** `GET /api/repairs/:id` adds the photos and the history, newest first. */
export interface RepairDetailJson extends RepairJson {
  photos: RepairPhotoJson[];
  history: RepairChangeJson[];
}

/** The queue call every open ticket is needed by. */
export interface NextQueueJson {
  matchId: string;
  queueAt: string;
}

/** `GET /api/events/:eventId/repairs`: every ticket of the event, in board order. */
export interface RepairListJson {
  repairs: RepairJson[] | RepairSummaryJson[];
  nextQueue: NextQueueJson | null;
  /** False for a viewer, who gets summaries only. */
  detail: boolean;
}
