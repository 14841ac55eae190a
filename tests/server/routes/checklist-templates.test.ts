import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../../shared/roles';
import { ChecklistTemplateVersion } from '../../../server/models';
import { signIn, signInEveryRole, testApp, type SignedIn } from '../../support/app';
import { itemId, makeOurMatch, makeRun, makeTemplate, preMatchBody, tick } from '../../support/checks';
import { FORBIDDEN, invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';

// GET/POST /api/checklist-templates, GET/PATCH /api/checklist-templates/:id.
const { app } = testApp();
let team: FactoryTeam;
let clients: Record<Role, SignedIn>;
beforeAll(async () => {
  team = await makeTeam();
  clients = await signInEveryRole(app, team.emails, PASSWORD);
});

const ISO = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;
const MAY_EDIT: Record<Role, boolean> = { admin: true, lead: true, crew: false, battery: false, safety: false, viewer: false };
const NOT_FOUND = { error: { code: 'not_found', message: 'Checklist template not found' } };

async function ownTeam() {
  const own = await makeTeam();
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  return { ...own, lead };
}

describe('template routes signed out', () => {
  it('answer 401 to every route and verb', async () => {
    const id = randomUUID();
    const answers = [
      await request(app).get('/api/checklist-templates'),
      await request(app).post('/api/checklist-templates').send(preMatchBody()),
      await request(app).get(`/api/checklist-templates/${id}`),
      await request(app).patch(`/api/checklist-templates/${id}`).send({ name: 'X' }),
    ];
    for (const answer of answers) {
      expect(answer.status).toBe(401);
      expect(answer.body).toEqual(UNAUTHENTICATED);
    }
  });
});

describe('POST /api/checklist-templates: bad input', () => {
  const item = (overrides: Record<string, unknown>) => preMatchBody({ items: [{ label: 'Item', kind: 'tick', required: true, ...overrides }] });
  const cases: [string, Record<string, unknown>, Record<string, string>][] = [
    ['nothing', {}, { name: 'Give the checklist a name', phase: 'Required', items: 'Required' }],
    ['a blank name', preMatchBody({ name: '   ' }), { name: 'Give the checklist a name' }],
    ['an unknown phase', preMatchBody({ phase: 'lunch' }), { phase: 'One of: pre_match, post_match, inspection, load_in, pack_out' }],
    ['no items', preMatchBody({ items: [] }), { items: 'A checklist needs at least one item' }],
    ['an item without a label', item({ label: '' }), { 'items.0.label': 'Give the item a label' }],
    ['an unknown kind', item({ kind: 'slider' }), { 'items.0.kind': 'Use tick, number, choice or text' }],
    ['required not a boolean', item({ required: 'yes' }), { 'items.0.required': 'true or false' }],
    ['a choice with one option', item({ kind: 'choice', options: ['Red'] }), { 'items.0.options': 'A choice needs at least two options' }],
    ['limits on a tick', item({ min: 1 }), { 'items.0.min': 'Only a number item has limits and a unit' }],
    ['a minimum above the maximum', item({ kind: 'number', min: 130, max: 100 }), { 'items.0.max': 'Must not be below the minimum' }],
    ['a bumper item that is not red or blue', item({ kind: 'choice', options: ['Green', 'Gold'], purpose: 'bumper_colour' }), { 'items.0.purpose': 'A bumper colour item is a choice with the options Red and Blue' }],
    ['an unknown role', item({ role: 'driver' }), { 'items.0.role': 'One of: admin, lead, crew, battery, safety, viewer' }],
    ['an unknown key', preMatchBody({ owner: 'me' }), { owner: 'Not a field of this request' }],
    ['an id that is not a UUID', preMatchBody({ id: 'pre-1' }), { id: 'Must be a UUID' }],
  ];
  for (const [what, body, fields] of cases) {
    it(`answers 400 naming the fields for ${what}`, async () => {
      const answer = await clients.lead.post('/api/checklist-templates', body);
      expect(answer.status).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    });
  }
});

describe('template routes per role', () => {
  for (const role of ROLES) {
    it(`${role}: reads templates; ${MAY_EDIT[role] ? 'may' : 'may not'} create or edit them`, async () => {
      const template = await makeTemplate(clients.admin, preMatchBody({ name: `Read by ${role}` }));
      const client = clients[role];
      expect((await client.get('/api/checklist-templates')).status).toBe(200);
      expect((await client.get(`/api/checklist-templates/${template.id}`)).status).toBe(200);

      const created = await client.post('/api/checklist-templates', preMatchBody({ name: `Made by ${role}` }));
      const edited = await client.patch(`/api/checklist-templates/${template.id}`, { name: `Edited by ${role}` });
      for (const answer of [created, edited]) {
        expect(answer.status).toBe(MAY_EDIT[role] ? (answer === created ? 201 : 200) : 403);
        if (!MAY_EDIT[role]) expect(answer.body).toEqual(FORBIDDEN);
      }
      const after = (await client.get(`/api/checklist-templates/${template.id}`)).body;
      expect(after.name).toBe(MAY_EDIT[role] ? `Edited by ${role}` : `Read by ${role}`);
    });
  }
});

describe('creating a template', () => {
  it('answers 201 with version 1, an id for every item, and who wrote it', async () => {
    const own = await ownTeam();
    const answer = await own.lead.post('/api/checklist-templates', preMatchBody());
    expect(answer.status).toBe(201);
    const ids = answer.body.items.map((item: { id: string }) => item.id);
    expect(new Set(ids).size).toBe(5);
    for (const id of ids) expect(id).toMatch(UUID);
    expect(answer.body).toEqual({
      id: expect.stringMatching(UUID),
      name: 'Before every match',
      phase: 'pre_match',
      version: 1,
      items: [
        { id: ids[0], label: 'Bumpers match our alliance', help: null, kind: 'choice', required: true, min: null, max: null, unit: null, options: ['Red', 'Blue'], role: null, purpose: 'bumper_colour' },
        { id: ids[1], label: 'Battery latched and strapped', help: 'Pull it: nothing moves', kind: 'tick', required: true, min: null, max: null, unit: null, options: [], role: 'battery', purpose: null },
        { id: ids[2], label: 'Stored air pressure', help: null, kind: 'number', required: true, min: 100, max: 120, unit: 'psi', options: [], role: null, purpose: null },
        { id: ids[3], label: 'Code version on the robot', help: null, kind: 'text', required: true, min: null, max: null, unit: null, options: [], role: null, purpose: null },
        { id: ids[4], label: 'Wipe the camera lens', help: null, kind: 'tick', required: false, min: null, max: null, unit: null, options: [], role: null, purpose: null },
      ],
      updatedAt: expect.stringMatching(ISO),
      updatedBy: { id: own.memberships.lead.userId, name: 'Factory lead' },
    });
    expect((await own.lead.get(`/api/checklist-templates/${answer.body.id}`)).body).toEqual(answer.body);
  });

  it('is idempotent on the client id: a resend answers 200 with the first template, unchanged', async () => {
    const own = await ownTeam();
    const id = randomUUID();
    const first = await own.lead.post('/api/checklist-templates', preMatchBody({ id }));
    expect(first.status).toBe(201);
    const again = await own.lead.post('/api/checklist-templates', preMatchBody({ id, name: 'A different name' }));
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    expect(await ChecklistTemplateVersion.count({ where: { templateId: id } })).toBe(1);
  });

  it("answers 409 id_taken for an id another team's template has", async () => {
    const theirs = await makeTemplate(clients.lead);
    const own = await ownTeam();
    const answer = await own.lead.post('/api/checklist-templates', preMatchBody({ id: theirs.id }));
    expect(answer.status).toBe(409);
    expect(answer.body).toEqual({ error: { code: 'id_taken', message: 'This id is already used by another record' } });
  });

  it("lists the team's templates by phase (as a weekend runs them), then name, and no other team's", async () => {
    const own = await ownTeam();
    await makeTemplate(own.lead, preMatchBody({ name: 'Pack the cart', phase: 'pack_out' }));
    await makeTemplate(own.lead, preMatchBody({ name: 'Zip ties', phase: 'pre_match' }));
    await makeTemplate(own.lead, preMatchBody({ name: 'After the match', phase: 'post_match' }));
    await makeTemplate(own.lead, preMatchBody({ name: 'Arms and wheels', phase: 'pre_match' }));
    await makeTemplate(own.lead, preMatchBody({ name: 'Inspection', phase: 'inspection' }));
    const list = await own.lead.get('/api/checklist-templates');
    expect(list.status).toBe(200);
    expect(list.body.map((t: { name: string }) => t.name)).toEqual(['Arms and wheels', 'Zip ties', 'After the match', 'Inspection', 'Pack the cart']);
  });
});

describe("another team's template", () => {
  it('answers 404 to read and to edit, and stays unchanged', async () => {
    const theirs = await makeTemplate(clients.lead);
    const own = await ownTeam();
    const read = await own.lead.get(`/api/checklist-templates/${theirs.id}`);
    expect(read.status).toBe(404);
    expect(read.body).toEqual(NOT_FOUND);
    const edit = await own.lead.patch(`/api/checklist-templates/${theirs.id}`, { name: 'Mine now' });
    expect(edit.status).toBe(404);
    expect(edit.body).toEqual(NOT_FOUND);
    expect((await clients.lead.get(`/api/checklist-templates/${theirs.id}`)).body).toEqual(theirs);
  });

  it('two teams sending one client id at the same moment: one template is made, the other answer is 409, never a 500', async () => {
    const own = await ownTeam();
    const id = randomUUID();
    // Each team's create locks only its own rows, so the primary key is what refuses the second.
    const answers = await Promise.all([clients.lead, own.lead].map((client) => client.post('/api/checklist-templates', { ...preMatchBody(), id })));
    expect(answers.map((answer) => answer.status).sort()).toEqual([201, 409]);
    expect(answers.find((answer) => answer.status === 409)?.body.error.code).toBe('id_taken');
  });

  it('answers 400 for an id that is not a UUID', async () => {
    const answer = await clients.lead.get('/api/checklist-templates/pre-1');
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ id: 'Must be a UUID' }));
  });
});

describe('editing a template', () => {
  it('makes a new version per change, by whoever changed it', async () => {
    const own = await ownTeam();
    const template = await makeTemplate(own.lead);
    const admin = await signIn(app, own.emails.admin, PASSWORD);
    const renamed = await admin.patch(`/api/checklist-templates/${template.id}`, { name: 'Before each match', version: 1 });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toEqual({
      ...template,
      name: 'Before each match',
      version: 2,
      updatedAt: expect.stringMatching(ISO),
      updatedBy: { id: own.memberships.admin.userId, name: 'Factory admin' },
    });
    const rephased = await admin.patch(`/api/checklist-templates/${template.id}`, { phase: 'inspection' });
    expect(rephased.body.version).toBe(3);
    expect(rephased.body.phase).toBe('inspection');
    expect(await ChecklistTemplateVersion.count({ where: { templateId: template.id } })).toBe(3);
  });

  it('answers a PATCH that changes nothing with the template as it was, without a new version', async () => {
    const own = await ownTeam();
    const template = await makeTemplate(own.lead);
    const sameItems = template.items.map(({ id: _id, ...item }) => item);
    for (const body of [{}, { version: 1 }, { name: template.name, phase: template.phase }, { items: sameItems }, { items: template.items }]) {
      const answer = await own.lead.patch(`/api/checklist-templates/${template.id}`, body);
      expect(answer.status, JSON.stringify(body)).toBe(200);
      expect(answer.body).toEqual(template);
    }
    expect(await ChecklistTemplateVersion.count({ where: { templateId: template.id } })).toBe(1);
  });

  it('answers 409 stale with the current template for an edit based on an old version, and changes nothing', async () => {
    const own = await ownTeam();
    const template = await makeTemplate(own.lead);
    const first = await own.lead.patch(`/api/checklist-templates/${template.id}`, { name: 'First editor', version: 1 });
    expect(first.status).toBe(200);
    const second = await own.lead.patch(`/api/checklist-templates/${template.id}`, { name: 'Second editor', version: 1 });
    expect(second.status).toBe(409);
    expect(second.body).toEqual({
      error: { code: 'stale', message: 'Someone else changed this record since you loaded it', current: first.body },
    });
    expect((await own.lead.get(`/api/checklist-templates/${template.id}`)).body).toEqual(first.body);
  });

  it('keeps the ids of items sent with their id, and of identical items sent without one; other items are new', async () => {
    const own = await ownTeam();
    const template = await makeTemplate(own.lead);
    const [bumper, battery, pressure, code, lens] = template.items;
    const { id: _pressureId, ...pressureWithoutId } = pressure;
    const { id: _lensId, ...lensWithoutId } = lens;
    const unknownId = randomUUID();
    const items = [
      { ...battery, label: 'Battery latched, strapped and checked' }, // edited, with its id: the same item
      lensWithoutId, // identical, without its id: keeps it
      { ...pressureWithoutId, max: 125 }, // changed, without its id: a new item
      { ...code, id: unknownId }, // an id the template never had: a new item
      tick('Radio and its cables secured'), // new
      bumper, // moved to the end, with its id
    ];
    const answer = await own.lead.patch(`/api/checklist-templates/${template.id}`, { items, version: 1 });
    expect(answer.status).toBe(200);
    expect(answer.body.version).toBe(2);
    const ids = answer.body.items.map((item: { id: string }) => item.id);
    expect(ids[0]).toBe(battery.id);
    expect(ids[1]).toBe(lens.id);
    expect(ids[5]).toBe(bumper.id);
    for (const index of [2, 3, 4]) expect([bumper.id, battery.id, pressure.id, code.id, lens.id, unknownId]).not.toContain(ids[index]);
    expect(new Set(ids).size).toBe(6);
    expect(answer.body.items[0].label).toBe('Battery latched, strapped and checked');
    expect(answer.body.items[2].max).toBe(125);
  });

  it('gives two identical items sent without ids the ids of two identical current items, one each', async () => {
    const own = await ownTeam();
    const template = await makeTemplate(own.lead, preMatchBody({ items: [tick('Check a wheel'), tick('Check a wheel'), tick('Check a wheel')] }));
    const answer = await own.lead.patch(`/api/checklist-templates/${template.id}`, {
      items: [tick('Check a wheel'), tick('Check a wheel'), tick('Check the frame')],
    });
    expect(answer.body.version).toBe(2);
    const ids = answer.body.items.map((item: { id: string }) => item.id);
    expect(ids.slice(0, 2)).toEqual(template.items.slice(0, 2).map((item) => item.id));
    expect(template.items.map((item) => item.id)).not.toContain(ids[2]);
  });

  it('answers 400 for bad fields, as creating does', async () => {
    const template = await makeTemplate(clients.lead);
    const cases: [Record<string, unknown>, Record<string, string>][] = [
      [{ name: '' }, { name: 'Give the checklist a name' }],
      [{ items: [] }, { items: 'A checklist needs at least one item' }],
      [{ version: -1 }, { version: 'The version number you loaded' }],
      [{ items: [tick('A', { id: 'x' }), tick('B', { id: 'x' })] }, { items: 'An item id is listed twice' }],
      [{ id: randomUUID() }, { id: 'Not a field of this request' }],
    ];
    for (const [body, fields] of cases) {
      const answer = await clients.lead.patch(`/api/checklist-templates/${template.id}`, body);
      expect(answer.status, JSON.stringify(body)).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    }
  });
});

describe('versioning', () => {
  it('an edit after a run started leaves the run as it began: same items, same version; a new run takes the new version', async () => {
    const own = await ownTeam();
    const template = await makeTemplate(own.lead);
    const q1 = await makeOurMatch(own.lead, own.event, { number: 1 });
    const q2 = await makeOurMatch(own.lead, own.event, { number: 2, scheduledStart: '2026-12-05T09:30:00.000Z' });
    const run = await makeRun(own.lead, own.event.id, template.id, q1.id);
    const marked = await own.lead.put(`/api/checklist-runs/${run.id}/items/${itemId(run, 'Stored air pressure')}`, { value: 110 });
    expect(marked.status).toBe(200);
    const before = (await own.lead.get(`/api/checklist-runs/${run.id}`)).body;

    const edited = await own.lead.patch(`/api/checklist-templates/${template.id}`, {
      name: 'Before every match, revised',
      items: [tick('Only one thing now')],
      version: 1,
    });
    expect(edited.status).toBe(200);
    expect(edited.body.version).toBe(2);

    const after = await own.lead.get(`/api/checklist-runs/${run.id}`);
    expect(after.body).toEqual(before);
    expect(after.body.templateVersion).toBe(1);
    expect(after.body.name).toBe('Before every match');
    expect(after.body.items.map((item: { label: string }) => item.label)).toEqual(template.items.map((item) => item.label));
    // The old version's items can still be marked.
    const still = await own.lead.put(`/api/checklist-runs/${run.id}/items/${itemId(run, 'Wipe the camera lens')}`, { value: true });
    expect(still.status).toBe(200);

    const next = await makeRun(own.lead, own.event.id, template.id, q2.id);
    expect(next.templateVersion).toBe(2);
    expect(next.name).toBe('Before every match, revised');
    expect(next.items.map((item) => item.label)).toEqual(['Only one thing now']);
  });
});
