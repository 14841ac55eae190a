import fs from 'node:fs';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import { afterAll, describe, expect, it } from 'vitest';
import type { IncidentJson } from '../../../shared/schemas/incidents';
import { signInEveryRole, testApp } from '../../support/app';
import { FORBIDDEN } from '../../support/errors';
import { makeTeam, PASSWORD } from '../../support/factories';
import { addIncidentPhoto, editIncident, incidentPhotoUrl, reportIncident, uploadIncidentPhoto } from '../../support/incidents';
import { fetchPhoto, makeImage } from '../../support/repairs';

// POST /api/incidents/:id/photos, GET and DELETE /api/incidents/:id/photos/:photoId: a ticket's
// photo rules (repair-photos.test.ts checks every type), and who may add, see and remove them.
const dataDir = path.resolve(process.env.DATA_DIR ?? 'data/test', 'uploads', `incident-photo-tests-${randomUUID()}`);
const { app, config } = testApp({ DATA_DIR: dataDir });
const photosDir = path.join(config.uploadsDir, 'incidents');
afterAll(() => fs.rmSync(dataDir, { recursive: true, force: true }));

const everyFile = () => (fs.existsSync(dataDir) ? (fs.readdirSync(dataDir, { recursive: true }) as string[]).sort() : []);

/** A team of our own, every role signed in, and a report by the crew. */
async function ownReport() {
  const own = await makeTeam();
  const as = await signInEveryRole(app, own.emails, PASSWORD);
  const report = await reportIncident(as.crew, { kind: 'injury', treatments: ['wound_covering'] });
  const read = async () => (await as.safety.get(`/api/incidents/${report.id}`)).body as IncidentJson;
  return { ...own, as, report, read };
}

describe('photos of a report', () => {
  it('takes a real JPEG from its reporter: stored upright without metadata under uploads/incidents, with a thumbnail; the version stays', async () => {
    const own = await ownReport();
    const jpeg = await makeImage({ width: 64, height: 48, exif: true });
    const answer = await uploadIncidentPhoto(own.as.crew, own.report.id, jpeg, { filename: 'IMG_0001.JPG' });
    expect(answer.status).toBe(201);
    const photo = answer.body;
    expect(photo).toEqual({ id: expect.any(String), contentType: 'image/jpeg', width: 48, height: 64, hasThumb: true, createdAt: expect.any(String) });
    expect(fs.readdirSync(photosDir).filter((name) => name.startsWith(photo.id)).sort()).toEqual([photo.id, `${photo.id}.thumb.webp`]);

    const url = incidentPhotoUrl(own.report.id, photo.id);
    const full = await fetchPhoto(own.as.safety, url);
    expect(full.status).toBe(200);
    expect(full.headers['content-type']).toBe('image/jpeg');
    expect(full.headers['x-content-type-options']).toBe('nosniff');
    const served = await sharp(full.body).metadata();
    expect([served.width, served.height, served.exif]).toEqual([48, 64, undefined]);
    const thumb = await fetchPhoto(own.as.crew, `${url}?size=thumb`);
    expect(thumb.headers['content-type']).toBe('image/webp');

    expect(await own.read()).toMatchObject({ version: 0, photos: [photo] });
  });

  it('is never kept by the browser: a shared pit tablet must not show an injury to whoever signs in next', async () => {
    const own = await ownReport();
    const photo = await addIncidentPhoto(own.as.crew, own.report.id);
    const url = incidentPhotoUrl(own.report.id, photo.id);
    for (const [client, size] of [[own.as.safety, ''], [own.as.safety, '?size=thumb'], [own.as.crew, '']] as const) {
      const served = await fetchPhoto(client, `${url}${size}`);
      expect(served.status).toBe(200);
      expect(served.headers['cache-control']).toBe('private, no-store');
    }
  });

  it('refuses what is not a photo (415) and a file over 10 MB (413), storing nothing', async () => {
    const own = await ownReport();
    const before = everyFile();
    const text = await uploadIncidentPhoto(own.as.crew, own.report.id, Buffer.from('Not a photo at all\n'));
    expect(text.status).toBe(415);
    expect(text.body).toEqual({
      error: { code: 'unsupported_type', message: 'This file is not a photo the board takes', fields: { photo: 'Send a JPEG, PNG, WebP or HEIC photo' } },
    });
    const jpeg = await makeImage();
    const huge = await uploadIncidentPhoto(own.as.crew, own.report.id, Buffer.concat([jpeg, Buffer.alloc(11 * 1024 * 1024 - jpeg.length)]));
    expect(huge.status).toBe(413);
    expect(everyFile()).toEqual(before);
    expect((await own.read()).photos).toEqual([]);
  });

  it('keeps at most 6 photos a report: the 7th answers 409 too_many_photos', async () => {
    const own = await ownReport();
    const image = await makeImage({ width: 16, height: 16 });
    for (let count = 0; count < 6; count++) await addIncidentPhoto(own.as.crew, own.report.id, image);
    const seventh = await uploadIncidentPhoto(own.as.safety, own.report.id, image);
    expect(seventh.status).toBe(409);
    expect(seventh.body).toEqual({ error: { code: 'too_many_photos', message: 'A report keeps at most 6 photos: remove one first' } });
  });
});

describe('who may add, see and remove them', () => {
  it('its reporter and the safety log’s readers add and see them; another member gets 403 before the upload is read', async () => {
    const own = await ownReport();
    const byReporter = await addIncidentPhoto(own.as.crew, own.report.id);
    const bySafety = await addIncidentPhoto(own.as.safety, own.report.id);
    const byAdmin = await addIncidentPhoto(own.as.admin, own.report.id);
    for (const role of ['lead', 'battery', 'viewer'] as const) {
      const upload = await uploadIncidentPhoto(own.as[role], own.report.id, await makeImage());
      expect(upload.status, role).toBe(403);
      expect(upload.body).toEqual(FORBIDDEN);
      expect((await own.as[role].get(incidentPhotoUrl(own.report.id, byReporter.id))).body).toEqual(FORBIDDEN);
    }
    for (const role of ['crew', 'safety', 'admin'] as const) {
      for (const photo of [byReporter, bySafety, byAdmin]) expect((await fetchPhoto(own.as[role], incidentPhotoUrl(own.report.id, photo.id))).status).toBe(200);
    }
    expect((await own.read()).photos.map((photo) => photo.id)).toEqual([byReporter.id, bySafety.id, byAdmin.id]);
  });

  it('a viewer adds photos to their own report and sees them there', async () => {
    const own = await ownReport();
    const mine = await reportIncident(own.as.viewer);
    const photo = await addIncidentPhoto(own.as.viewer, mine.id);
    expect((await fetchPhoto(own.as.viewer, incidentPhotoUrl(mine.id, photo.id))).status).toBe(200);
    expect((await own.as.viewer.get(`/api/incidents/${mine.id}`)).body.photos).toEqual([photo]);
  });

  it('safety captains and mentors remove any photo (its files go); its reporter may not; a photo of another report is 404', async () => {
    const own = await ownReport();
    const photo = await addIncidentPhoto(own.as.crew, own.report.id);
    const url = incidentPhotoUrl(own.report.id, photo.id);
    expect((await own.as.crew.delete(url)).body).toEqual(FORBIDDEN);

    const other = await reportIncident(own.as.crew);
    const elsewhere = await own.as.safety.delete(incidentPhotoUrl(other.id, photo.id));
    expect(elsewhere.status).toBe(404);
    expect(elsewhere.body).toEqual({ error: { code: 'not_found', message: 'Photo not found' } });

    expect((await own.as.safety.delete(url)).status).toBe(204);
    expect(fs.readdirSync(photosDir).filter((name) => name.startsWith(photo.id))).toEqual([]);
    expect((await own.as.safety.get(url)).status).toBe(404);
    expect((await own.read()).photos).toEqual([]);
    // Closing later still works: photos never touched the version.
    await editIncident(own.as.safety, own.report, { status: 'closed', closingNote: 'Bandaged, fine' });
  });
});
