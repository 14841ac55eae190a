import { expect } from 'vitest';
import type { IncidentJson, IncidentPhotoJson } from '../../shared/schemas/incidents';
import { OutboxMail } from '../../server/models';
import type { SignedIn } from './app';
import { makeImage } from './repairs';

/** A valid body for POST /api/incidents: a near miss in the pit an hour ago; override any field. */
export const incidentBody = (overrides: Record<string, unknown> = {}) => ({
  occurredAt: new Date(Date.now() - 60 * 60_000).toISOString(),
  location: 'pit',
  kind: 'near_miss',
  description: 'A drill slipped off the bench and fell next to a foot',
  ...overrides,
});

/** Reports an incident through the API and expects 201; answers the report as the reporter sees it. */
export async function reportIncident(client: SignedIn, overrides: Record<string, unknown> = {}) {
  const answer = await client.post('/api/incidents', incidentBody(overrides));
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as IncidentJson;
}

/** PATCHes a report and expects 200; answers it. */
export async function editIncident(client: SignedIn, incident: { id: string; version: number }, changes: Record<string, unknown>) {
  const answer = await client.patch(`/api/incidents/${incident.id}`, { version: incident.version, ...changes });
  expect(answer.status, JSON.stringify(answer.body)).toBe(200);
  return answer.body as IncidentJson;
}

/** The alert messages queued for an incident: address and subject, sorted by address. */
export async function queuedAlerts(incidentId: string) {
  const rows = await OutboxMail.findAll({ where: { incidentId }, order: [['toAddress', 'ASC']] });
  return rows.map((row) => ({ to: row.toAddress, subject: row.subject, kind: row.kind, teamId: row.teamId }));
}

/** Uploads a file to a report as a tablet's form would (multipart, field `photo`). */
export const uploadIncidentPhoto = (client: SignedIn, incidentId: string, content: Buffer, { filename = 'photo.jpg', contentType = 'image/jpeg' } = {}) =>
  client.agent.post(`/api/incidents/${incidentId}/photos`).set('x-csrf-token', client.csrfToken).attach('photo', content, { filename, contentType });

/** Uploads a real photo to a report and expects 201; answers the photo. */
export async function addIncidentPhoto(client: SignedIn, incidentId: string, content?: Buffer) {
  const answer = await uploadIncidentPhoto(client, incidentId, content ?? (await makeImage()));
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as IncidentPhotoJson;
}

export const incidentPhotoUrl = (incidentId: string, photoId: string) => `/api/incidents/${incidentId}/photos/${photoId}`;
