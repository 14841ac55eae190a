import fs from 'node:fs';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import zlib from 'node:zlib';
import sharp from 'sharp';
import { afterAll, describe, expect, it } from 'vitest';
import type { Role } from '../../../shared/roles';
import type { RepairDetailJson, RepairPhotoJson } from '../../../shared/schemas/repairs';
import { signIn, testApp, type SignedIn } from '../../support/app';
import { FORBIDDEN, invalid } from '../../support/errors';
import { makeTeam, PASSWORD } from '../../support/factories';
import { addPhoto, fetchPhoto, makeImage, makeRepair, uploadPhoto } from '../../support/repairs';

// POST /api/repairs/:id/photos, GET and DELETE /api/repairs/:id/photos/:photoId.
// A data folder of this file's own (inside the test run's uploads, which the run empties): its
// listings show exactly what these uploads wrote, whatever other files do meanwhile.
const dataDir = path.resolve(process.env.DATA_DIR ?? 'data/test', 'uploads', `photo-tests-${randomUUID()}`);
const { app, config } = testApp({ DATA_DIR: dataDir });
const photosDir = path.join(config.uploadsDir, 'repairs');
afterAll(() => fs.rmSync(dataDir, { recursive: true, force: true }));

/** Every file under the data folder, as paths relative to it. */
const everyFile = () => (fs.existsSync(dataDir) ? (fs.readdirSync(dataDir, { recursive: true }) as string[]).sort() : []);

const UNSUPPORTED = {
  error: { code: 'unsupported_type', message: 'This file is not a photo the board takes', fields: { photo: 'Send a JPEG, PNG, WebP or HEIC photo' } },
};
const PHOTO_NOT_FOUND = { error: { code: 'not_found', message: 'Photo not found' } };
const REPAIR_NOT_FOUND = { error: { code: 'not_found', message: 'Repair not found' } };
const UUID_NAME = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}(\.thumb\.webp)?$/;

/** A team of our own, every role signed in, and a ticket reported by the crew. */
async function ownTicket() {
  const own = await makeTeam();
  const as = {} as Record<Role, SignedIn>;
  for (const role of ['admin', 'lead', 'crew', 'battery', 'safety', 'viewer'] as const) as[role] = await signIn(app, own.emails[role], PASSWORD);
  const repair = await makeRepair(as.crew, own.event.id);
  const detail = async () => (await as.lead.get(`/api/repairs/${repair.id}`)).body as RepairDetailJson;
  return { ...own, as, repair, detail, userOf: (role: Role) => own.memberships[role].userId };
}

const filesOf = (photoId: string) => fs.readdirSync(photosDir).filter((name) => name.startsWith(photoId)).sort();

/** A HEIC container's opening (the `ftyp` box with the `heic` brand): what the content check reads. This server's sharp cannot decode it. */
const heicHeader = () =>
  Buffer.concat([Buffer.from([0, 0, 0, 0x18]), Buffer.from('ftypheic'), Buffer.from([0, 0, 0, 0]), Buffer.from('mif1heic'), Buffer.alloc(200, 7)]);

/** A tiny PNG whose header claims `width` × `height`: a decompression bomb as the server first sees one. */
function pngClaiming(width: number, height: number) {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type), data]);
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(zlib.crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 2, 0, 0, 0], 8); // 8-bit RGB
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, chunk('IHDR', header), chunk('IDAT', zlib.deflateSync(Buffer.alloc(64))), chunk('IEND', Buffer.alloc(0))]);
}

describe('uploading a photo', () => {
  it('takes a real JPEG: 201, stored upright without its metadata, with a WebP thumbnail; the ticket shows it, its version stays', async () => {
    const own = await ownTicket();
    // 64 × 48 with EXIF orientation 6 (turned a quarter) and a description that stands in for GPS data.
    const jpeg = await makeImage({ width: 64, height: 48, exif: true });
    expect((await sharp(jpeg).metadata()).exif).toBeDefined();

    const answer = await uploadPhoto(own.as.crew, own.repair.id, jpeg, { filename: 'IMG_2041.JPG' });
    expect(answer.status).toBe(201);
    const photo: RepairPhotoJson = answer.body;
    expect(photo).toEqual({
      id: expect.stringMatching(UUID_NAME),
      contentType: 'image/jpeg',
      byteSize: expect.any(Number),
      width: 48,
      height: 64,
      hasThumb: true,
      uploadedBy: { id: own.userOf('crew'), displayName: 'Factory crew' },
      uploadedAt: expect.any(String),
      url: `/api/repairs/${own.repair.id}/photos/${photo.id}`,
      thumbUrl: `/api/repairs/${own.repair.id}/photos/${photo.id}?size=thumb`,
    });
    // Stored under its generated id, never the name it came with.
    expect(filesOf(photo.id)).toEqual([photo.id, `${photo.id}.thumb.webp`]);
    expect(fs.readdirSync(photosDir).some((name) => name.includes('IMG_2041'))).toBe(false);

    const full = await fetchPhoto(own.as.safety, photo.url);
    expect(full.status).toBe(200);
    expect(full.headers['content-type']).toBe('image/jpeg');
    expect(full.headers['x-content-type-options']).toBe('nosniff');
    expect(full.headers['content-disposition']).toBe('inline');
    expect(full.headers['cache-control']).toBe('private, max-age=31536000, immutable');
    // A photo opened on its own tab loads nothing from elsewhere.
    expect(full.headers['content-security-policy']).toMatch(/default-src 'self'/);
    expect(full.body.length).toBe(photo.byteSize);
    const served = await sharp(full.body).metadata();
    expect([served.format, served.width, served.height, served.exif, served.orientation]).toEqual(['jpeg', 48, 64, undefined, undefined]);

    const thumb = await fetchPhoto(own.as.battery, photo.thumbUrl!);
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    expect(thumb.headers['x-content-type-options']).toBe('nosniff');
    expect((await sharp(thumb.body).metadata()).format).toBe('webp');

    const detail = await own.detail();
    expect(detail).toMatchObject({ version: 0, photoCount: 1, coverThumbUrl: photo.thumbUrl, photos: [photo] });
    expect(detail.history[0]).toMatchObject({ kind: 'photo_added', by: { id: own.userOf('crew') }, changes: { photo: [null, photo.id] } });
  });

  it('takes PNG and WebP, re-encoded in their own type; the thumbnail fits inside 320 × 320', async () => {
    const own = await ownTicket();
    const png = await addPhoto(own.as.lead, own.repair.id, await makeImage({ width: 800, height: 600, format: 'png' }));
    expect(png).toMatchObject({ contentType: 'image/png', width: 800, height: 600, hasThumb: true });
    const thumb = await sharp((await fetchPhoto(own.as.crew, png.thumbUrl!)).body).metadata();
    expect([thumb.format, thumb.width, thumb.height]).toEqual(['webp', 320, 240]);
    const full = await fetchPhoto(own.as.crew, png.url);
    expect(full.headers['content-type']).toBe('image/png');

    const webp = await addPhoto(own.as.admin, own.repair.id, await makeImage({ format: 'webp' }));
    expect(webp).toMatchObject({ contentType: 'image/webp', width: 64, height: 48 });
    // The cover is the first photo's thumbnail.
    expect((await own.detail()).coverThumbUrl).toBe(png.thumbUrl);
  });

  it('keeps a HEIC as sent; without a decoder it has no size and no thumbnail (404 no_thumbnail)', async () => {
    const own = await ownTicket();
    const heic = heicHeader();
    const photo = await addPhoto(own.as.crew, own.repair.id, heic);
    expect(photo).toMatchObject({ contentType: 'image/heic', byteSize: heic.length, width: null, height: null, hasThumb: false, thumbUrl: null });
    expect(filesOf(photo.id)).toEqual([photo.id]);
    const full = await fetchPhoto(own.as.crew, photo.url);
    expect(full.headers['content-type']).toBe('image/heic');
    expect(Buffer.compare(full.body, heic)).toBe(0);
    const thumb = await own.as.crew.get(`${photo.url}?size=thumb`);
    expect(thumb.status).toBe(404);
    expect(thumb.body).toEqual({ error: { code: 'no_thumbnail', message: 'This photo has no thumbnail: open the photo itself' } });
    expect((await own.detail()).coverThumbUrl).toBeNull();
  });

  it('refuses (415) a text file named .jpg and declared image/jpeg, a GIF, an SVG and a cut-off JPEG: type by content, nothing stored', async () => {
    const own = await ownTicket();
    const before = everyFile();
    const jpeg = await makeImage();
    const gif = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#fff' } }).gif().toBuffer();
    const uploads: [Buffer, string][] = [
      [Buffer.from('This is not a photo, just text in a file called photo.jpg\n'), 'photo.jpg'],
      [gif, 'photo.jpg'],
      [Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="8" height="8"><script>alert(1)</script></svg>'), 'photo.jpg'],
      [jpeg.subarray(0, 40), 'photo.jpg'],
    ];
    for (const [content, filename] of uploads) {
      const answer = await uploadPhoto(own.as.crew, own.repair.id, content, { filename, contentType: 'image/jpeg' });
      expect(answer.status).toBe(415);
      expect(answer.body).toEqual(UNSUPPORTED);
    }
    expect((await own.detail()).photoCount).toBe(0);
    expect((await own.detail()).history.map((row) => row.kind)).toEqual(['created']);
    expect(everyFile()).toEqual(before);
  });

  it('refuses (413) a file over 10 MB, and stores nothing', async () => {
    const own = await ownTicket();
    const before = everyFile();
    const jpeg = await makeImage();
    const huge = Buffer.concat([jpeg, Buffer.alloc(11 * 1024 * 1024 - jpeg.length)]);
    const answer = await uploadPhoto(own.as.crew, own.repair.id, huge);
    expect(answer.status).toBe(413);
    expect(answer.body).toEqual({ error: { code: 'too_large', message: 'The photo is larger than 10 MB', fields: { photo: 'Send a smaller photo' } } });
    expect((await own.detail()).photoCount).toBe(0);
    expect(everyFile()).toEqual(before);
  });

  it('stores an upload named ../../x.jpg under a generated name inside the uploads folder, and nothing outside it', async () => {
    const own = await ownTicket();
    const before = everyFile();
    const answer = await uploadPhoto(own.as.crew, own.repair.id, await makeImage(), { filename: '../../x.jpg' });
    expect(answer.status).toBe(201);
    const photo: RepairPhotoJson = answer.body;
    // Exactly two new files, under the generated id, inside uploads/repairs; no x.jpg where the name would have led.
    const added = everyFile().filter((name) => !before.includes(name));
    expect(added).toEqual([path.join('uploads', 'repairs', photo.id), path.join('uploads', 'repairs', `${photo.id}.thumb.webp`)]);
    for (const name of fs.readdirSync(photosDir)) expect(name).toMatch(UUID_NAME);
    expect(fs.readdirSync(config.uploadsDir)).toEqual(['repairs']);
    for (const escaped of [path.resolve(photosDir, '../../x.jpg'), path.resolve(photosDir, '../x.jpg'), path.resolve(config.uploadsDir, '../../x.jpg'), path.resolve('../../x.jpg')]) {
      expect(fs.existsSync(escaped), escaped).toBe(false);
    }
  });

  it('keeps at most 6 photos a ticket: the 7th answers 409 too_many_photos', async () => {
    const own = await ownTicket();
    const image = await makeImage({ width: 16, height: 16 });
    for (let count = 0; count < 6; count++) await addPhoto(own.as.crew, own.repair.id, image);
    const seventh = await uploadPhoto(own.as.crew, own.repair.id, image);
    expect(seventh.status).toBe(409);
    expect(seventh.body).toEqual({ error: { code: 'too_many_photos', message: 'A ticket keeps at most 6 photos: remove one first' } });
    expect((await own.detail()).photos).toHaveLength(6);
  });

  it('answers 400 for a form without the photo field, a JSON body, a cut-off form; 404 for another team\'s ticket', async () => {
    const own = await ownTicket();
    const other = await ownTicket();
    const image = await makeImage();
    const url = `/api/repairs/${own.repair.id}/photos`;
    expect((await uploadPhoto(own.as.crew, own.repair.id, image, { field: 'file' })).body).toEqual(invalid({ photo: 'Send one photo in the form field "photo"' }));
    expect((await own.as.crew.post(url, { photo: 'data:image/jpeg;base64,AAAA' })).body).toEqual(invalid({ photo: 'Required' }));
    const cut = await own.as.crew.agent
      .post(url)
      .set('x-csrf-token', own.as.crew.csrfToken)
      .set('Content-Type', 'multipart/form-data; boundary=XYZ')
      .send('--XYZ\r\nContent-Disposition: form-data; name="photo"; filename="a.jpg"\r\nContent-Type: image/jpeg\r\n\r\nabc');
    expect(cut.status).toBe(400);
    expect(cut.body).toEqual({ error: { code: 'bad_request', message: 'The upload is not a readable multipart form' } });

    const foreign = await uploadPhoto(own.as.crew, other.repair.id, image);
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual(REPAIR_NOT_FOUND);
    expect((await other.detail()).photoCount).toBe(0);
    expect((await own.as.crew.post('/api/repairs/not-a-uuid/photos')).body).toEqual(invalid({ id: 'Must be a UUID' }));
  });
});

describe('a photo too big to open', () => {
  it('refuses (413) an image of more than 100 megapixels before decoding it', async () => {
    const own = await ownTicket();
    const answer = await uploadPhoto(own.as.crew, own.repair.id, pngClaiming(20_000, 20_000), { filename: 'plan.png', contentType: 'image/png' });
    expect(answer.status).toBe(413);
    expect(answer.body).toEqual({ error: { code: 'too_large', message: 'The photo has more than 100 megapixels', fields: { photo: 'Send a smaller photo' } } });
    expect((await own.detail()).photoCount).toBe(0);
  });
});

describe('reading a photo', () => {
  it("answers 404 for another team's photo, a photo of another ticket, an unknown id; 400 for bad ids and sizes", async () => {
    const own = await ownTicket();
    const other = await ownTicket();
    const theirs = await addPhoto(other.as.crew, other.repair.id);
    const second = await makeRepair(own.as.crew, own.event.id, { title: 'Second ticket' });
    const ours = await addPhoto(own.as.crew, own.repair.id);

    for (const client of [own.as.admin, own.as.lead, own.as.crew]) {
      const answer = await client.get(theirs.url);
      expect(answer.status).toBe(404);
      expect(answer.body).toEqual(REPAIR_NOT_FOUND);
      expect((await client.get(theirs.thumbUrl!)).status).toBe(404);
    }
    // Our own photo, asked for under another ticket of ours: not found there.
    expect((await own.as.crew.get(`/api/repairs/${second.id}/photos/${ours.id}`)).body).toEqual(PHOTO_NOT_FOUND);
    expect((await own.as.crew.get(`/api/repairs/${own.repair.id}/photos/${randomUUID()}`)).body).toEqual(PHOTO_NOT_FOUND);
    expect((await own.as.crew.get(`/api/repairs/${own.repair.id}/photos/..%2F..%2Fsecret`)).body).toEqual(invalid({ photoId: 'Must be a UUID' }));
    expect((await own.as.crew.get(`${ours.url}?size=huge`)).body).toEqual(invalid({ size: 'Use full or thumb' }));
    // Errors carry nosniff too.
    expect((await own.as.crew.get(theirs.url)).headers['x-content-type-options']).toBe('nosniff');
  });

  it('viewers get 403 for photos; battery and safety read them but may not add or remove any', async () => {
    const own = await ownTicket();
    const photo = await addPhoto(own.as.crew, own.repair.id);
    const image = await makeImage();
    expect((await own.as.viewer.get(photo.url)).body).toEqual(FORBIDDEN);
    expect((await own.as.viewer.get(photo.thumbUrl!)).status).toBe(403);
    for (const role of ['viewer', 'battery', 'safety'] as const) {
      const upload = await uploadPhoto(own.as[role], own.repair.id, image);
      expect(upload.status).toBe(403);
      expect(upload.body).toEqual(FORBIDDEN);
      expect((await own.as[role].delete(photo.url)).body).toEqual(FORBIDDEN);
    }
    for (const role of ['battery', 'safety'] as const) expect((await own.as[role].get(photo.url)).status).toBe(200);
    expect((await own.detail()).photos.map((one) => one.id)).toEqual([photo.id]);
  });
});

describe('removing a photo', () => {
  it('crew may not remove another member\'s photo (403); the uploader removes their own; a lead removes any; the files go', async () => {
    const own = await ownTicket();
    const byLead = await addPhoto(own.as.lead, own.repair.id);
    const byCrew = await addPhoto(own.as.crew, own.repair.id);
    const byAdmin = await addPhoto(own.as.admin, own.repair.id);

    const refused = await own.as.crew.delete(byLead.url);
    expect(refused.status).toBe(403);
    expect(refused.body).toEqual(FORBIDDEN);
    expect(filesOf(byLead.id)).toHaveLength(2);

    expect((await own.as.crew.delete(byCrew.url)).status).toBe(204);
    expect((await own.as.lead.delete(byAdmin.url)).status).toBe(204);
    expect((await own.as.admin.delete(byLead.url)).status).toBe(204);
    expect(filesOf(byCrew.id)).toEqual([]);
    expect(filesOf(byAdmin.id)).toEqual([]);
    expect(filesOf(byLead.id)).toEqual([]);
    expect((await own.as.crew.get(byCrew.url)).body).toEqual(PHOTO_NOT_FOUND);
    expect((await own.as.crew.delete(byCrew.url)).body).toEqual(PHOTO_NOT_FOUND);

    const detail = await own.detail();
    expect(detail).toMatchObject({ photos: [], photoCount: 0, coverThumbUrl: null, version: 0 });
    expect(detail.history.slice(0, 3).map((row) => [row.kind, row.by.id, row.changes])).toEqual([
      ['photo_removed', own.userOf('admin'), { photo: [byLead.id, null] }],
      ['photo_removed', own.userOf('lead'), { photo: [byAdmin.id, null] }],
      ['photo_removed', own.userOf('crew'), { photo: [byCrew.id, null] }],
    ]);
  });

  it("answers 404 for another team's photo, and leaves it", async () => {
    const own = await ownTicket();
    const other = await ownTicket();
    const theirs = await addPhoto(other.as.crew, other.repair.id);
    const answer = await own.as.admin.delete(theirs.url);
    expect(answer.status).toBe(404);
    expect(answer.body).toEqual(REPAIR_NOT_FOUND);
    expect(filesOf(theirs.id)).toHaveLength(2);
    expect((await other.detail()).photoCount).toBe(1);
  });
});
