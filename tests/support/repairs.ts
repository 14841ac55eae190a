import { expect } from 'vitest';
import sharp from 'sharp';
import type { RepairJson, RepairListJson, RepairPhotoJson } from '../../shared/schemas/repairs';
import type { SignedIn } from './app';

/** A valid body for POST /api/events/:eventId/repairs; override any field. */
export const repairBody = (overrides: Record<string, unknown> = {}) => ({
  title: 'Left drive belt skipping teeth',
  subsystem: 'drivetrain',
  severity: 'degraded',
  ...overrides,
});

/** Reports a problem through the API (as admin, lead or crew) and answers the ticket. */
export async function makeRepair(client: SignedIn, eventId: string, overrides: Record<string, unknown> = {}) {
  const answer = await client.post(`/api/events/${eventId}/repairs`, repairBody(overrides));
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as RepairJson;
}

/** PATCHes a ticket and expects 200; answers the ticket. */
export async function editRepair(client: SignedIn, repair: { id: string; version: number }, changes: Record<string, unknown>) {
  const answer = await client.patch(`/api/repairs/${repair.id}`, { version: repair.version, ...changes });
  expect(answer.status, JSON.stringify(answer.body)).toBe(200);
  return answer.body as RepairJson;
}

/** The event's board as a client with detail reads it. */
export async function boardOf(client: SignedIn, eventId: string, query = '') {
  const answer = await client.get(`/api/events/${eventId}/repairs${query}`);
  expect(answer.status, JSON.stringify(answer.body)).toBe(200);
  return answer.body as RepairListJson & { repairs: RepairJson[] };
}

/** Titles of one column, top to bottom. */
export const columnOf = (board: { repairs: { title: string; status: string }[] }, status: string) =>
  board.repairs.filter((repair) => repair.status === status).map((repair) => repair.title);

/**
 * A small real image made here (no binary fixture in the repository): a two-colour picture, so
 * that it is not blank, in the given format; EXIF (orientation 6, a quarter turn, and a GPS-looking description) when asked.
 */
export async function makeImage({ width = 64, height = 48, format = 'jpeg', exif = false }: { width?: number; height?: number; format?: 'jpeg' | 'png' | 'webp'; exif?: boolean } = {}) {
  const half = await sharp({ create: { width: Math.ceil(width / 2), height, channels: 3, background: '#2b6cb0' } }).png().toBuffer();
  let image = sharp({ create: { width, height, channels: 3, background: '#e53e3e' } }).composite([{ input: half, left: 0, top: 0 }]);
  if (exif) image = image.withMetadata({ orientation: 6 }).withExif({ IFD0: { ImageDescription: 'GPS 48.1372 N 11.5756 E' } });
  return image.toFormat(format).toBuffer();
}

/** Uploads a file as a tablet's form would (multipart, field `photo`); name and declared type as given. */
export function uploadPhoto(
  client: SignedIn,
  repairId: string,
  content: Buffer,
  { filename = 'photo.jpg', contentType = 'image/jpeg', field = 'photo' }: { filename?: string; contentType?: string; field?: string } = {},
) {
  return client.agent.post(`/api/repairs/${repairId}/photos`).set('x-csrf-token', client.csrfToken).attach(field, content, { filename, contentType });
}

/** Uploads a real photo and expects 201; answers the photo. */
export async function addPhoto(client: SignedIn, repairId: string, content?: Buffer) {
  const answer = await uploadPhoto(client, repairId, content ?? (await makeImage()));
  expect(answer.status, JSON.stringify(answer.body)).toBe(201);
  return answer.body as RepairPhotoJson;
}

/** Reads a photo's bytes as a Buffer, whatever its type. */
export const fetchPhoto = (client: SignedIn, url: string) =>
  client.agent
    .get(url)
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
