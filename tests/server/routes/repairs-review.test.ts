import fs from 'node:fs';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import type { Role } from '../../../shared/roles';
import type { RepairDetailJson } from '../../../shared/schemas/repairs';
import { signIn, testApp } from '../../support/app';
import { invalid } from '../../support/errors';
import { makeTeam, PASSWORD } from '../../support/factories';
import { addPhoto, boardOf, columnOf, editRepair, makeImage, makeRepair } from '../../support/repairs';

// Edge cases from the review of the repairs server that the other files do not pin: odd bodies
// answer 4xx (never 500), neighbours that cannot be, an assignee who left, photo headers on HEAD.
const dataDir = path.resolve(process.env.DATA_DIR ?? 'data/test', 'uploads', `review-tests-${randomUUID()}`);
const { app, config } = testApp({ DATA_DIR: dataDir });
afterAll(() => fs.rmSync(dataDir, { recursive: true, force: true }));

async function ownTeam() {
  const own = await makeTeam();
  const crew = await signIn(app, own.emails.crew, PASSWORD);
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  const userOf = (role: Role) => own.memberships[role].userId;
  const report = (title: string, overrides: Record<string, unknown> = {}) => makeRepair(crew, own.event.id, { title, ...overrides });
  return { ...own, crew, lead, userOf, report };
}

const NOT_IN_COLUMN = 'Must be another card of the column the ticket goes to';

describe('placing by hand: neighbours that cannot be', () => {
  it('the same card as both neighbours, or the ticket itself, answers 400 and writes nothing', async () => {
    const own = await ownTeam();
    const a = await own.report('A', { severity: 'blocks_match' });
    const b = await own.report('B', { severity: 'degraded' });
    const url = `/api/repairs/${b.id}`;
    expect((await own.lead.patch(url, { version: 0, afterId: a.id, beforeId: a.id })).body).toEqual(invalid({ beforeId: 'Must come after the card named in afterId' }));
    expect((await own.lead.patch(url, { version: 0, afterId: b.id, beforeId: b.id })).body).toEqual(invalid({ afterId: NOT_IN_COLUMN, beforeId: NOT_IN_COLUMN }));
    // Into another column, the ticket is still not a neighbour of itself, nor a card left behind.
    expect((await own.lead.patch(url, { version: 0, status: 'in_progress', beforeId: b.id })).body).toEqual(invalid({ beforeId: NOT_IN_COLUMN }));
    expect((await own.lead.patch(url, { version: 0, status: 'in_progress', afterId: a.id })).body).toEqual(invalid({ afterId: NOT_IN_COLUMN }));
    const detail = (await own.lead.get(url)).body as RepairDetailJson;
    expect(detail).toMatchObject({ status: 'reported', version: 0, placedByHand: false });
    expect(detail.history.map((row) => row.kind)).toEqual(['created']);
  });

  it('a lead moves a card to the top of another column with one write: moved, placed and edited rows', async () => {
    const own = await ownTeam();
    const first = await own.report('Already working', { severity: 'blocks_match' });
    await editRepair(own.crew, first, { status: 'in_progress' });
    const card = await own.report('Late find', { severity: 'cosmetic' });
    const moved = await editRepair(own.lead, card, { status: 'in_progress', afterId: null, severity: 'degraded' });
    expect(moved).toMatchObject({ status: 'in_progress', severity: 'degraded', placedByHand: true, version: 1 });
    expect(columnOf(await boardOf(own.lead, own.event.id), 'in_progress')).toEqual(['Late find', 'Already working']);
    const { history } = (await own.lead.get(`/api/repairs/${card.id}`)).body as RepairDetailJson;
    expect(history.map((row) => row.kind)).toEqual(['moved', 'placed', 'edited', 'created']);
  });
});

describe('assignees', () => {
  it('a member who was deactivated cannot be assigned; one already assigned stays through other edits', async () => {
    const own = await ownTeam();
    const ticket = await own.report('Loose chain', { assigneeId: own.userOf('crew') });
    await own.memberships.admin.update({ active: false });
    expect((await own.crew.patch(`/api/repairs/${ticket.id}`, { version: 0, assigneeId: own.userOf('admin') })).body).toEqual(
      invalid({ assigneeId: 'Pick a member of the team who works on repairs' }),
    );
    expect((await own.crew.post(`/api/events/${own.event.id}/repairs`, { title: 'x', subsystem: 'arm', severity: 'cosmetic', assigneeId: own.userOf('admin') })).body).toEqual(
      invalid({ assigneeId: 'Pick a member of the team who works on repairs' }),
    );
    await own.memberships.crew.update({ active: false });
    // The assignee is unchanged, so not checked again: the ticket can still be worked on.
    expect(await editRepair(own.lead, ticket, { title: 'Loose chain, left side' })).toMatchObject({ assignee: { id: own.userOf('crew') }, version: 1 });
  });
});

describe('odd photo uploads', () => {
  it('a multipart type without a boundary, two photos, a photo under another name: 400, nothing stored', async () => {
    const own = await ownTeam();
    const ticket = await own.report('Cracked bracket');
    const url = `/api/repairs/${ticket.id}/photos`;
    const post = () => own.crew.agent.post(url).set('x-csrf-token', own.crew.csrfToken);
    const image = await makeImage();

    const noBoundary = await post().set('Content-Type', 'multipart/form-data').send('not a form');
    expect(noBoundary.status).toBe(400);
    expect(noBoundary.body).toEqual({ error: { code: 'bad_request', message: 'The upload is not a readable multipart form' } });
    const oneOnly = invalid({ photo: 'Send one photo in the form field "photo"' });
    expect((await post().attach('photo', image, 'a.jpg').attach('photo', image, 'b.jpg')).body).toEqual(oneOnly);
    expect((await post().attach('photo', image, 'a.jpg').attach('other', image, 'b.jpg')).body).toEqual(oneOnly);
    expect((await post().field('photo', 'just text')).body).toEqual(invalid({ photo: 'Required' }));
    expect((await post().attach('photo', Buffer.alloc(0), { filename: 'empty.jpg', contentType: 'image/jpeg' })).body).toEqual(
      invalid({ photo: 'The file is empty' }),
    );
    expect(((await own.lead.get(`/api/repairs/${ticket.id}`)).body as RepairDetailJson).photos).toEqual([]);
    expect(fs.existsSync(path.join(config.uploadsDir, 'repairs')) ? fs.readdirSync(path.join(config.uploadsDir, 'repairs')) : []).toEqual([]);
  });

  it('HEAD on a photo answers its headers: type from the content, nosniff, inline, private cache', async () => {
    const own = await ownTeam();
    const ticket = await own.report('Bent plate');
    const photo = await addPhoto(own.crew, ticket.id, await makeImage({ format: 'png' }));
    const head = await own.crew.agent.head(photo.url);
    expect(head.status).toBe(200);
    expect(head.headers).toMatchObject({
      'content-type': 'image/png',
      'x-content-type-options': 'nosniff',
      'content-disposition': 'inline',
      'cache-control': 'private, max-age=31536000, immutable',
      'content-length': String(photo.byteSize),
    });
  });
});
