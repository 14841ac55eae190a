import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../../shared/roles';
import type { RunJson, TemplateJson } from '../../../shared/schemas/checks';
import { ChecklistItemState, ChecklistMark } from '../../../server/models';
import { signIn, signInEveryRole, testApp, type SignedIn } from '../../support/app';
import { itemId, makeOurMatch, makeRun, makeTemplate, preMatchBody, tick } from '../../support/checks';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';
import { matchBody } from '../../support/schedule';

// GET/POST /api/events/:eventId/checklist-runs, GET /api/checklist-runs/:runId, PUT/DELETE
// /api/checklist-runs/:runId/items/:itemId and POST /api/checklist-runs/:runId/sign-off.
const { app } = testApp();
let team: FactoryTeam;
let clients: Record<Role, SignedIn>;
let template: TemplateJson;
beforeAll(async () => {
  team = await makeTeam();
  clients = await signInEveryRole(app, team.emails, PASSWORD);
  template = await makeTemplate(clients.lead);
});

const ISO = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;
const MAY_MARK: Record<Role, boolean> = { admin: true, lead: true, crew: true, battery: false, safety: false, viewer: false };
const MAY_SIGN_OFF: Record<Role, boolean> = { admin: true, lead: true, crew: false, battery: false, safety: false, viewer: false };
const RUN_NOT_FOUND = { error: { code: 'not_found', message: 'Checklist run not found' } };

/** A team of our own with a pre-match template, one of our matches and a run for it. */
async function ownRun() {
  const own = await makeTeam();
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  const crew = await signIn(app, own.emails.crew, PASSWORD);
  const ownTemplate = await makeTemplate(lead);
  const match = await makeOurMatch(lead, own.event);
  const run = await makeRun(crew, own.event.id, ownTemplate.id, match.id);
  const itemUrl = (label: string) => `/api/checklist-runs/${run.id}/items/${itemId(run, label)}`;
  return { ...own, lead, crew, template: ownTemplate, match, run, itemUrl, runUrl: `/api/checklist-runs/${run.id}` };
}

describe('run routes signed out', () => {
  it('answer 401 to every route and verb', async () => {
    const runId = randomUUID();
    const answers = [
      await request(app).get(`/api/events/${team.event.id}/checklist-runs`),
      await request(app).post(`/api/events/${team.event.id}/checklist-runs`).send({ templateId: template.id }),
      await request(app).get(`/api/checklist-runs/${runId}`),
      await request(app).put(`/api/checklist-runs/${runId}/items/a`).send({ value: true }),
      await request(app).delete(`/api/checklist-runs/${runId}/items/a`),
      await request(app).post(`/api/checklist-runs/${runId}/sign-off`).send({}),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });
});

describe('run routes per role', () => {
  for (const role of ROLES) {
    const may = [MAY_MARK[role] ? 'may start runs and mark' : 'may not start runs or mark', MAY_SIGN_OFF[role] ? 'may sign off' : 'may not sign off'];
    it(`${role}: reads runs; ${may.join('; ')}`, async () => {
      const own = await ownRun();
      const client = await signIn(app, own.emails[role], PASSWORD);
      expect((await client.get(`/api/events/${own.event.id}/checklist-runs`)).status).toBe(200);
      expect((await client.get(own.runUrl)).status).toBe(200);

      const writes = [
        [await client.post(`/api/events/${own.event.id}/checklist-runs`, { templateId: own.template.id }), 201],
        [await client.put(own.itemUrl('Wipe the camera lens'), { value: true }), 200],
        [await client.delete(own.itemUrl('Wipe the camera lens')), 200],
      ] as const;
      for (const [answer, status] of writes) {
        expect(answer.status).toBe(MAY_MARK[role] ? status : 403);
        if (!MAY_MARK[role]) expect(answer.body).toEqual(FORBIDDEN);
      }
      const signOff = await client.post(`${own.runUrl}/sign-off`, { reason: 'Field called us early' });
      expect(signOff.status).toBe(MAY_SIGN_OFF[role] ? 200 : 403);
      if (!MAY_SIGN_OFF[role]) expect(signOff.body).toEqual(FORBIDDEN);
      expect((await client.get(own.runUrl)).body.signOff === null).toBe(!MAY_SIGN_OFF[role]);
      const history = await ChecklistMark.count({ where: { runId: own.run.id } });
      expect(history).toBe(MAY_MARK[role] ? 2 : 0);
    });
  }
});

describe('starting a run', () => {
  it('answers 201 with every item of the current version, unmarked, and the match with our alliance', async () => {
    const own = await makeTeam();
    const lead = await signIn(app, own.emails.lead, PASSWORD);
    const crew = await signIn(app, own.emails.crew, PASSWORD);
    const ownTemplate = await makeTemplate(lead);
    const match = await makeOurMatch(lead, own.event, { number: 4, alliance: 'blue' });
    const answer = await crew.post(`/api/events/${own.event.id}/checklist-runs`, { templateId: ownTemplate.id, matchId: match.id });
    expect(answer.status).toBe(201);
    expect(answer.body).toEqual({
      id: expect.any(String),
      eventId: own.event.id,
      templateId: ownTemplate.id,
      templateVersion: 1,
      name: 'Before every match',
      phase: 'pre_match',
      match: { id: match.id, level: 'qualification', number: 4, alliance: 'blue' },
      items: ownTemplate.items.map((item) => ({ ...item, value: null, note: null, done: false, failed: false, markedBy: null, markedAt: null })),
      progress: { total: 5, done: 0, required: 4, requiredDone: 0, failed: 0 },
      complete: false,
      signOff: null,
      createdAt: expect.stringMatching(ISO),
      createdBy: { id: own.memberships.crew.userId, name: 'Factory crew' },
    });
    expect((await crew.get(`/api/checklist-runs/${answer.body.id}`)).body).toEqual(answer.body);
  });

  it('is idempotent on the client id, and keeps one run per template and match', async () => {
    const own = await ownRun();
    const id = randomUUID();
    const url = `/api/events/${own.event.id}/checklist-runs`;
    // The match already has a run of this template: a second start answers it.
    const second = await own.lead.post(url, { id, templateId: own.template.id, matchId: own.match.id });
    expect(second.status).toBe(200);
    expect(second.body).toEqual(own.run);

    const free = await own.lead.post(url, { id, templateId: own.template.id });
    expect(free.status).toBe(201);
    expect(free.body.id).toBe(id);
    expect(free.body.match).toBeNull();
    const resent = await own.lead.post(url, { id, templateId: own.template.id });
    expect(resent.status).toBe(200);
    expect(resent.body).toEqual(free.body);
    // Runs of no match may repeat.
    const another = await own.lead.post(url, { templateId: own.template.id });
    expect(another.status).toBe(201);
    expect(another.body.id).not.toBe(id);
  });

  it('starts two runs of one template for one match at once as one run', async () => {
    const own = await makeTeam();
    const lead = await signIn(app, own.emails.lead, PASSWORD);
    const crew = await signIn(app, own.emails.crew, PASSWORD);
    const ownTemplate = await makeTemplate(lead);
    const match = await makeOurMatch(lead, own.event);
    const body = { templateId: ownTemplate.id, matchId: match.id };
    const url = `/api/events/${own.event.id}/checklist-runs`;
    const answers = await Promise.all([lead.post(url, body), crew.post(url, body)]);
    expect(answers.map((answer) => answer.status).sort()).toEqual([200, 201]);
    expect(answers[0].body.id).toBe(answers[1].body.id);
    expect((await lead.get(url)).body).toHaveLength(1);
  });

  it('answers 400 naming the fields', async () => {
    const url = `/api/events/${team.event.id}/checklist-runs`;
    const cases: [Record<string, unknown>, Record<string, string>][] = [
      [{}, { templateId: 'Required' }],
      [{ templateId: 'pre-match' }, { templateId: 'Must be a UUID' }],
      [{ templateId: template.id, matchId: 7 }, { matchId: 'Must be a UUID' }],
      [{ templateId: template.id, id: 'mine' }, { id: 'Must be a UUID' }],
      [{ templateId: template.id, when: 'now' }, { when: 'Not a field of this request' }],
    ];
    for (const [body, fields] of cases) {
      const answer = await clients.lead.post(url, body);
      expect(answer.status, JSON.stringify(body)).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    }
  });

  it('answers 400 for a match we do not play in, 404 for a match of another event or a template of another team', async () => {
    const url = `/api/events/${team.event.id}/checklist-runs`;
    const notOurs = await clients.lead.post(`/api/events/${team.event.id}/matches`, matchBody({ number: 60 }));
    expect(notOurs.status).toBe(201);
    const answer = await clients.lead.post(url, { templateId: template.id, matchId: notOurs.body.id });
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ matchId: 'We do not play in this match' }));

    const other = await ownRun();
    const foreignMatch = await clients.lead.post(url, { templateId: template.id, matchId: other.match.id });
    expect(foreignMatch.status).toBe(404);
    expect(foreignMatch.body).toEqual({ error: { code: 'not_found', message: 'Match not found' } });
    const foreignTemplate = await clients.lead.post(url, { templateId: other.template.id });
    expect(foreignTemplate.status).toBe(404);
    expect(foreignTemplate.body).toEqual({ error: { code: 'not_found', message: 'Checklist template not found' } });
    const foreignEvent = await clients.lead.post(`/api/events/${other.event.id}/checklist-runs`, { templateId: template.id });
    expect(foreignEvent.status).toBe(404);
    expect(foreignEvent.body).toEqual({ error: { code: 'not_found', message: 'Event not found' } });
    const foreignId = await clients.lead.post(url, { id: other.run.id, templateId: template.id });
    expect(foreignId.status).toBe(409);
    expect(foreignId.body.error.code).toBe('id_taken');
  });
});

describe('listing runs', () => {
  it('lists the event runs newest first, without items, filtered by match on request', async () => {
    const own = await ownRun();
    const later = await makeOurMatch(own.lead, own.event, { number: 2, scheduledStart: '2026-12-05T09:40:00.000Z' });
    const post = await makeTemplate(own.lead, preMatchBody({ name: 'After every match', phase: 'post_match' }));
    const second = await makeRun(own.lead, own.event.id, post.id, own.match.id);
    const third = await makeRun(own.lead, own.event.id, own.template.id, later.id);
    const list = await own.crew.get(`/api/events/${own.event.id}/checklist-runs`);
    expect(list.status).toBe(200);
    const { items: _items, ...summary } = third;
    expect(list.body[0]).toEqual(summary);
    expect(list.body.map((run: RunJson) => run.id)).toEqual([third.id, second.id, own.run.id]);
    const forMatch = await own.crew.get(`/api/events/${own.event.id}/checklist-runs?matchId=${own.match.id}`);
    expect(forMatch.body.map((run: RunJson) => run.id)).toEqual([second.id, own.run.id]);
    expect((await own.crew.get(`/api/events/${own.event.id}/checklist-runs?matchId=7`)).body).toEqual(invalid({ matchId: 'Must be a UUID' }));
  });
});

describe("another team's run", () => {
  it('answers 404 to read, list, mark, un-mark and sign off, and changes nothing', async () => {
    const theirs = await ownRun();
    const item = itemId(theirs.run, 'Wipe the camera lens');
    const answers = [
      await clients.lead.get(theirs.runUrl),
      await clients.lead.put(`${theirs.runUrl}/items/${item}`, { value: true }),
      await clients.lead.delete(`${theirs.runUrl}/items/${item}`),
      await clients.lead.post(`${theirs.runUrl}/sign-off`, { reason: 'Not our robot at all' }),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(404);
      expect(answer.body).toEqual(RUN_NOT_FOUND);
    }
    const list = await clients.lead.get(`/api/events/${theirs.event.id}/checklist-runs`);
    expect(list.status).toBe(404);
    expect((await theirs.lead.get(theirs.runUrl)).body).toEqual(theirs.run);
    expect(await ChecklistMark.count({ where: { runId: theirs.run.id } })).toBe(0);
  });

  it('answers 400 for a run id that is not a UUID and 404 for an item the run does not have', async () => {
    const own = await ownRun();
    const bad = await own.crew.get('/api/checklist-runs/run-1');
    expect(bad.status).toBe(400);
    expect(bad.body).toEqual(invalid({ runId: 'Must be a UUID' }));
    const unknown = await own.crew.put(`${own.runUrl}/items/${randomUUID()}`, { value: true });
    expect(unknown.status).toBe(404);
    expect(unknown.body).toEqual({ error: { code: 'not_found', message: 'Item not found' } });
  });
});

describe('marking items', () => {
  it('records a tick with who and when, and counts it as done', async () => {
    const own = await ownRun();
    const before = Date.now();
    const answer = await own.crew.put(own.itemUrl('Battery latched and strapped'), { value: true, note: 'Strap replaced' });
    expect(answer.status).toBe(200);
    const item = own.template.items.find((candidate) => candidate.label === 'Battery latched and strapped')!;
    expect(answer.body).toEqual({
      ...item,
      value: true,
      note: 'Strap replaced',
      done: true,
      failed: false,
      markedBy: { id: own.memberships.crew.userId, name: 'Factory crew' },
      markedAt: expect.stringMatching(ISO),
    });
    expect(Date.parse(answer.body.markedAt)).toBeGreaterThanOrEqual(before - 1000);
    const run = (await own.lead.get(own.runUrl)).body as RunJson;
    expect(run.items.find((candidate) => candidate.id === item.id)).toEqual(answer.body);
    expect(run.progress).toEqual({ total: 5, done: 1, required: 4, requiredDone: 1, failed: 0 });
  });

  it('stores a number within its limits as done, and one outside them as failed and not done', async () => {
    const own = await ownRun();
    const inside = await own.crew.put(own.itemUrl('Stored air pressure'), { value: 118.5 });
    expect(inside.status).toBe(200);
    expect(inside.body).toMatchObject({ value: 118.5, done: true, failed: false });
    const outside = await own.crew.put(own.itemUrl('Stored air pressure'), { value: 90 });
    expect(outside.status).toBe(200);
    expect(outside.body).toMatchObject({ value: 90, done: false, failed: true });
    const run = (await own.lead.get(own.runUrl)).body as RunJson;
    expect(run.items.find((item) => item.label === 'Stored air pressure')).toMatchObject({ value: 90, done: false, failed: true });
    expect(run.progress.failed).toBe(1);
    expect(run.complete).toBe(false);
  });

  it('stores a choice and a text as sent', async () => {
    const own = await ownRun();
    const choice = await own.crew.put(own.itemUrl('Bumpers match our alliance'), { value: 'Blue' });
    expect(choice.body).toMatchObject({ value: 'Blue', done: true, failed: false });
    const text = await own.crew.put(own.itemUrl('Code version on the robot'), { value: 'build 2026.12.1 "quill"' });
    expect(text.body).toMatchObject({ value: 'build 2026.12.1 "quill"', done: true, failed: false });
    const run = (await own.crew.get(own.runUrl)).body as RunJson;
    expect(run.items.map((item) => item.value)).toEqual(['Blue', null, null, 'build 2026.12.1 "quill"', null]);
  });

  it('answers 400 for a value that does not fit the kind of item, and stores nothing', async () => {
    const own = await ownRun();
    const cases: [string, unknown, string][] = [
      ['Battery latched and strapped', false, 'A tick is marked with true (un-mark it to clear)'],
      ['Battery latched and strapped', 'yes', 'A tick is marked with true (un-mark it to clear)'],
      ['Stored air pressure', '110', 'Give a number'],
      ['Bumpers match our alliance', 'Green', 'Pick one of: Red, Blue'],
      ['Code version on the robot', '   ', 'Write something, or un-mark the item'],
      ['Code version on the robot', true, 'Write something, or un-mark the item'],
    ];
    for (const [label, value, problem] of cases) {
      const answer = await own.crew.put(own.itemUrl(label), { value });
      expect(answer.status, `${label}: ${JSON.stringify(value)}`).toBe(400);
      expect(answer.body).toEqual(invalid({ value: problem }));
    }
    const shapes: [Record<string, unknown>, Record<string, string>][] = [
      [{}, { value: 'true, a number or a text' }],
      [{ value: null }, { value: 'true, a number or a text' }],
      [{ value: 'x'.repeat(501) }, { value: 'At most 500 characters' }],
      [{ value: true, by: 'me' }, { by: 'Not a field of this request' }],
    ];
    for (const [body, fields] of shapes) {
      const answer = await own.crew.put(own.itemUrl('Code version on the robot'), body);
      expect(answer.status, JSON.stringify(body)).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    }
    expect(await ChecklistMark.count({ where: { runId: own.run.id } })).toBe(0);
    expect((await own.crew.get(own.runUrl)).body).toEqual(own.run);
  });

  it('un-marks an item: value null, not done, and the history keeps the mark and who took it back', async () => {
    const own = await ownRun();
    const url = own.itemUrl('Battery latched and strapped');
    expect((await own.crew.put(url, { value: true })).status).toBe(200);
    const cleared = await own.lead.delete(url);
    expect(cleared.status).toBe(200);
    expect(cleared.body).toMatchObject({ value: null, note: null, done: false, failed: false, markedBy: null, markedAt: null });
    const run = (await own.crew.get(own.runUrl)).body as RunJson;
    expect(run.items.find((item) => item.label === 'Battery latched and strapped')).toEqual(cleared.body);
    const history = await ChecklistMark.findAll({ where: { runId: own.run.id }, order: [['markedAt', 'ASC'], ['value', 'DESC']] });
    expect(history.map((mark) => [mark.value, mark.markedById])).toEqual([
      ['true', own.memberships.crew.userId],
      [null, own.memberships.lead.userId],
    ]);
  });
});

describe('signing off', () => {
  it('refuses an incomplete run without a reason of a few words, and keeps the reason it is given', async () => {
    const own = await ownRun();
    for (const body of [{}, { reason: '' }, { reason: 'ok' }]) {
      const answer = await own.lead.post(`${own.runUrl}/sign-off`, body);
      expect(answer.status, JSON.stringify(body)).toBe(400);
      expect(answer.body).toEqual(invalid({ reason: 'Items are still open: say why the run is done anyway (at least 5 characters)' }));
    }
    expect((await own.lead.get(own.runUrl)).body.signOff).toBeNull();
    const signed = await own.lead.post(`${own.runUrl}/sign-off`, { reason: 'Queue called early; pressure checked by eye' });
    expect(signed.status).toBe(200);
    expect(signed.body.signOff).toEqual({
      by: { id: own.memberships.lead.userId, name: 'Factory lead' },
      at: expect.stringMatching(ISO),
      reason: 'Queue called early; pressure checked by eye',
    });
    expect(signed.body.complete).toBe(false);
    // Signed off already: a resend answers the run as it is.
    const again = await own.lead.post(`${own.runUrl}/sign-off`, {});
    expect(again.status).toBe(200);
    expect(again.body).toEqual(signed.body);
  });

  it('signs off a complete run without a reason', async () => {
    const own = await ownRun();
    const marks = [
      ['Bumpers match our alliance', 'Red'],
      ['Battery latched and strapped', true],
      ['Stored air pressure', 110],
      ['Code version on the robot', 'v12'],
    ] as const;
    for (const [label, value] of marks) expect((await own.crew.put(own.itemUrl(label), { value })).status).toBe(200);
    const run = (await own.crew.get(own.runUrl)).body as RunJson;
    expect(run.complete).toBe(true);
    expect(run.progress).toEqual({ total: 5, done: 4, required: 4, requiredDone: 4, failed: 0 });
    const signed = await own.lead.post(`${own.runUrl}/sign-off`, {});
    expect(signed.status).toBe(200);
    expect(signed.body.signOff).toMatchObject({ reason: null, by: { id: own.memberships.lead.userId } });
  });

  it('a number out of limits keeps a run from being complete', async () => {
    const own = await ownRun();
    const marks = [
      ['Bumpers match our alliance', 'Red'],
      ['Battery latched and strapped', true],
      ['Stored air pressure', 130],
      ['Code version on the robot', 'v12'],
    ] as const;
    for (const [label, value] of marks) expect((await own.crew.put(own.itemUrl(label), { value })).status).toBe(200);
    const answer = await own.lead.post(`${own.runUrl}/sign-off`, {});
    expect(answer.status).toBe(400);
    expect(answer.body.error.fields).toHaveProperty('reason');
  });
});

describe('marks at the same moment', () => {
  it('20 marks of 20 different items sent at once from two sessions are all stored and in the run', async () => {
    const own = await makeTeam();
    const lead = await signIn(app, own.emails.lead, PASSWORD);
    const crew = await signIn(app, own.emails.crew, PASSWORD);
    const labels = Array.from({ length: 20 }, (_, index) => `Wheel bolt ${index + 1} torqued`);
    const big = await makeTemplate(lead, preMatchBody({ name: 'Twenty bolts', items: labels.map((label) => tick(label)) }));
    const run = await makeRun(lead, own.event.id, big.id);

    const answers = await Promise.all(
      run.items.map((item, index) => (index % 2 === 0 ? lead : crew).put(`/api/checklist-runs/${run.id}/items/${item.id}`, { value: true })),
    );
    expect(answers.map((answer) => answer.status)).toEqual(Array(20).fill(200));

    for (const client of [lead, crew]) {
      const after = (await client.get(`/api/checklist-runs/${run.id}`)).body as RunJson;
      expect(after.items.map((item) => item.value)).toEqual(Array(20).fill(true));
      expect(after.items.map((item) => item.markedBy?.id)).toEqual(
        labels.map((_, index) => (index % 2 === 0 ? own.memberships.lead.userId : own.memberships.crew.userId)),
      );
      expect(after.progress).toEqual({ total: 20, done: 20, required: 20, requiredDone: 20, failed: 0 });
    }
    expect(await ChecklistItemState.count({ where: { runId: run.id, value: 'true' } })).toBe(20);
    expect(await ChecklistMark.count({ where: { runId: run.id } })).toBe(20);
  });

  it('two marks of the same item at once leave one value, which both sessions then read', async () => {
    const own = await ownRun();
    const url = own.itemUrl('Stored air pressure');
    const answers = await Promise.all([own.lead.put(url, { value: 104 }), own.crew.put(url, { value: 117 })]);
    expect(answers.map((answer) => answer.status)).toEqual([200, 200]);
    const seen = await Promise.all([own.lead.get(own.runUrl), own.crew.get(own.runUrl)]);
    const values = seen.map(({ body }) => (body as RunJson).items.find((item) => item.label === 'Stored air pressure')!);
    expect(values[0]).toEqual(values[1]);
    expect([104, 117]).toContain(values[0].value);
    // The stored value, who and when belong to one of the two marks: the last write won whole.
    const winner = answers.find((answer) => answer.body.value === values[0].value)!;
    expect(values[0]).toEqual(winner.body);
    expect(await ChecklistMark.count({ where: { runId: own.run.id } })).toBe(2);
  });
});
