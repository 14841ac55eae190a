import type { Transaction } from 'sequelize';
import { classifyIncident, immediateAlertReasons } from '../../shared/domain/incident-classification';
import type { IncidentJson, IncidentPhotoJson } from '../../shared/schemas/incidents';
import { Battery, IncidentPhoto, Membership, User, type Incident } from '../models';

/** `full` for those who read the safety log; `reporter` for the one who sent a report, without what the safety captains added. */
export type IncidentView = IncidentJson['view'];

/** The names and files behind the ids of a set of incidents, each looked up in one query. */
interface Context {
  people: Map<string, string>;
  owners: Map<string, string>;
  batteries: Map<string, string>;
  photos: Map<string, IncidentPhotoJson[]>;
}

const UNKNOWN = 'Unknown member';

async function contextOf(incidents: readonly Incident[], transaction?: Transaction): Promise<Context> {
  const ids = incidents.map((incident) => incident.id);
  const reporterIds = [...new Set(incidents.map((incident) => incident.reporterId))];
  const ownerIds = [...new Set(incidents.flatMap((incident) => incident.followUps.map((followUp) => followUp.ownerId)))];
  const batteryIds = [...new Set(incidents.flatMap((incident) => (incident.batteryId ? [incident.batteryId] : [])))];
  const [reporters, owners, batteries, photos] = await Promise.all([
    reporterIds.length ? User.findAll({ where: { id: reporterIds }, attributes: ['id', 'name'], transaction }) : [],
    ownerIds.length
      ? Membership.findAll({ where: { id: ownerIds }, include: [{ model: User, as: 'user', attributes: ['name'] }], transaction })
      : [],
    batteryIds.length ? Battery.findAll({ where: { id: batteryIds }, attributes: ['id', 'label'], transaction }) : [],
    ids.length ? IncidentPhoto.findAll({ where: { incidentId: ids }, order: [['createdAt', 'ASC'], ['id', 'ASC']], transaction }) : [],
  ]);
  const byIncident = new Map<string, IncidentPhotoJson[]>(ids.map((id) => [id, []]));
  for (const photo of photos) byIncident.get(photo.incidentId)!.push(presentIncidentPhoto(photo));
  return {
    people: new Map(reporters.map((user) => [user.id, user.name])),
    owners: new Map(owners.map((member) => [member.id, member.user?.name ?? UNKNOWN])),
    batteries: new Map(batteries.map((battery) => [battery.id, battery.label])),
    photos: byIncident,
  };
}

export const presentIncidentPhoto = (photo: IncidentPhoto): IncidentPhotoJson => ({
  id: photo.id,
  contentType: photo.contentType,
  width: photo.width,
  height: photo.height,
  hasThumb: photo.hasThumb,
  createdAt: photo.createdAt.toISOString(),
});

function presentWith(incident: Incident, view: IncidentView, context: Context): IncidentJson {
  const full = view === 'full';
  return {
    id: incident.id,
    eventId: incident.eventId,
    occurredAt: incident.occurredAt.toISOString(),
    location: incident.location,
    kind: incident.kind,
    description: incident.description,
    involved: incident.involved,
    treatments: incident.treatments,
    immediateActions: incident.immediateActions,
    batteryId: incident.batteryId,
    batteryName: incident.batteryId ? (context.batteries.get(incident.batteryId) ?? null) : null,
    classification: classifyIncident(incident),
    alertReasons: immediateAlertReasons(incident),
    status: incident.status,
    view,
    // What the safety captains add (who does what next, how it was closed) stays with them.
    followUps: full
      ? incident.followUps.map((followUp) => ({ ...followUp, ownerName: context.owners.get(followUp.ownerId) ?? UNKNOWN }))
      : [],
    closingNote: full ? incident.closingNote : null,
    closedAt: incident.closedAt ? incident.closedAt.toISOString() : null,
    photos: context.photos.get(incident.id) ?? [],
    reporter: { id: incident.reporterId, name: context.people.get(incident.reporterId) ?? UNKNOWN },
    createdAt: incident.createdAt.toISOString(),
    updatedAt: incident.updatedAt.toISOString(),
    version: incident.version,
  };
}

/** Incidents as the safety log lists them (full view). */
export async function presentIncidents(incidents: readonly Incident[], transaction?: Transaction): Promise<IncidentJson[]> {
  const context = await contextOf(incidents, transaction);
  return incidents.map((incident) => presentWith(incident, 'full', context));
}

/** One incident in the caller's view. */
export async function presentIncident(incident: Incident, view: IncidentView, transaction?: Transaction): Promise<IncidentJson> {
  return presentWith(incident, view, await contextOf([incident], transaction));
}
