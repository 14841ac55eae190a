import type { Transaction } from 'sequelize';
import { urgencyOf } from '../../shared/domain/repair-urgency';
import type {
  PersonJson,
  RepairChangeJson,
  RepairChangeKind,
  RepairDetailJson,
  RepairJson,
  RepairPhotoJson,
  RepairSummaryJson,
} from '../../shared/schemas/repairs';
import { Event, RepairChange, RepairPhoto, User, type Repair } from '../models';
import { urgencyTicketOf } from '../repairs/urgency-ticket';
import { nextQueueOf } from '../repairs/next-queue';

type People = Map<string, PersonJson>;

interface PhotoFacts {
  count: number;
  coverThumbUrl: string | null;
}

/** What every ticket of one answer shares: the names behind ids, photo counts, the queue call and the clock. */
interface BoardContext {
  people: People;
  photos: Map<string, PhotoFacts>;
  nextQueueAt: string | null;
  now: Date;
}

export const photoUrl = (repairId: string, photoId: string) => `/api/repairs/${repairId}/photos/${photoId}`;
export const photoThumbUrl = (repairId: string, photoId: string) => `${photoUrl(repairId, photoId)}?size=thumb`;

/** Names of the people behind these ids, in one query. */
async function peopleOf(ids: Iterable<string | null>, transaction?: Transaction): Promise<People> {
  const wanted = [...new Set([...ids].filter((id): id is string => id !== null))];
  if (wanted.length === 0) return new Map();
  const users = await User.findAll({ where: { id: wanted }, attributes: ['id', 'name'], transaction });
  return new Map(users.map((user) => [user.id, { id: user.id, displayName: user.name }]));
}

// Users are never deleted while tickets name them (the foreign keys refuse), so a miss is a bug.
const personOf = (people: People, id: string): PersonJson => people.get(id) ?? { id, displayName: 'Unknown member' };

/** How many photos each ticket has, and the first one's thumbnail (oldest first) for its card. */
async function photoFactsOf(repairIds: readonly string[], transaction?: Transaction): Promise<Map<string, PhotoFacts>> {
  const facts = new Map<string, PhotoFacts>(repairIds.map((id) => [id, { count: 0, coverThumbUrl: null }]));
  if (repairIds.length === 0) return facts;
  const photos = await RepairPhoto.findAll({
    where: { repairId: [...repairIds] },
    attributes: ['id', 'repairId', 'hasThumb', 'createdAt'],
    order: [['createdAt', 'ASC'], ['id', 'ASC']],
    transaction,
  });
  for (const photo of photos) {
    const fact = facts.get(photo.repairId)!;
    fact.count += 1;
    if (fact.coverThumbUrl === null && photo.hasThumb) fact.coverThumbUrl = photoThumbUrl(photo.repairId, photo.id);
  }
  return facts;
}

function presentWith(repair: Repair, { people, photos, nextQueueAt, now }: BoardContext): RepairJson {
  const reportedAt = repair.createdAt.toISOString();
  const photo = photos.get(repair.id) ?? { count: 0, coverThumbUrl: null };
  return {
    id: repair.id,
    eventId: repair.eventId,
    title: repair.title,
    description: repair.description,
    subsystem: repair.subsystem,
    severity: repair.severity,
    status: repair.status,
    orderKey: repair.orderKey,
    placedByHand: repair.placedByHand,
    foundInMatchId: repair.foundInMatchId,
    reporter: personOf(people, repair.reporterId),
    assignee: repair.assigneeId === null ? null : personOf(people, repair.assigneeId),
    estimateMinutes: repair.estimateMinutes,
    timeSpentMinutes: repair.timeSpentMinutes,
    partsUsed: repair.partsUsed,
    resolutionNote: repair.resolutionNote,
    photoCount: photo.count,
    coverThumbUrl: photo.coverThumbUrl,
    reportedAt,
    updatedAt: repair.updatedAt.toISOString(),
    doneAt: repair.doneAt ? repair.doneAt.toISOString() : null,
    urgency: urgencyOf(urgencyTicketOf(repair), nextQueueAt, now),
    version: repair.version,
  };
}

/** Tickets of one event as writers and readers with `repairs:read` see them, with urgency at `now`. */
export async function presentRepairs(
  repairs: readonly Repair[],
  { nextQueueAt, now }: { nextQueueAt: string | null; now: Date },
  transaction?: Transaction,
): Promise<RepairJson[]> {
  const people = await peopleOf(
    repairs.flatMap((repair) => [repair.reporterId, repair.assigneeId]),
    transaction,
  );
  const photos = await photoFactsOf(
    repairs.map((repair) => repair.id),
    transaction,
  );
  return repairs.map((repair) => presentWith(repair, { people, photos, nextQueueAt, now }));
}

/** One ticket, its urgency against its event's next queue call now. */
export async function presentRepair(repair: Repair, transaction?: Transaction, now = new Date()): Promise<RepairJson> {
  const event = await Event.findByPk(repair.eventId, { transaction, rejectOnEmpty: true });
  const nextQueue = await nextQueueOf(event, now, transaction);
  const [json] = await presentRepairs([repair], { nextQueueAt: nextQueue?.queueAt ?? null, now }, transaction);
  return json;
}

/** What a viewer reads: title, status and place. */
export const presentRepairSummary = (repair: Repair): RepairSummaryJson => ({
  id: repair.id,
  eventId: repair.eventId,
  title: repair.title,
  status: repair.status,
  orderKey: repair.orderKey,
  version: repair.version,
});

export const presentPhoto = (photo: RepairPhoto, people: People): RepairPhotoJson => ({
  id: photo.id,
  contentType: photo.contentType,
  byteSize: photo.byteSize,
  width: photo.width,
  height: photo.height,
  hasThumb: photo.hasThumb,
  uploadedBy: personOf(people, photo.uploadedById),
  uploadedAt: photo.createdAt.toISOString(),
  url: photoUrl(photo.repairId, photo.id),
  thumbUrl: photo.hasThumb ? photoThumbUrl(photo.repairId, photo.id) : null,
});

/** One photo as its upload answers it. */
export async function presentOnePhoto(photo: RepairPhoto, transaction?: Transaction) {
  return presentPhoto(photo, await peopleOf([photo.uploadedById], transaction));
}

// The rows one write makes share its instant: list them in the order they were written.
const KIND_ORDER: readonly RepairChangeKind[] = ['created', 'moved', 'placed', 'assigned', 'edited', 'photo_added', 'photo_removed'];

/** The ticket with its photos (oldest first) and its history (newest first). */
export async function presentRepairDetail(repair: Repair, now = new Date()): Promise<RepairDetailJson> {
  const json = await presentRepair(repair, undefined, now);
  const photos = await RepairPhoto.findAll({ where: { repairId: repair.id }, order: [['createdAt', 'ASC'], ['id', 'ASC']] });
  const changes = await RepairChange.findAll({ where: { repairId: repair.id } });
  changes.sort((a, b) => b.at.getTime() - a.at.getTime() || KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) || (a.id < b.id ? -1 : 1));
  const people = await peopleOf([...photos.map((photo) => photo.uploadedById), ...changes.map((change) => change.byId)]);
  const history: RepairChangeJson[] = changes.map((change) => ({
    id: change.id,
    kind: change.kind,
    by: personOf(people, change.byId),
    at: change.at.toISOString(),
    changes: change.changes,
  }));
  return { ...json, photos: photos.map((photo) => presentPhoto(photo, people)), history };
}
