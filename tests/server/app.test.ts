import { beforeAll, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import { Team } from '../../server/models';
import { signIn, testApp, type SignedIn } from '../support/app';
import { makeTeam, PASSWORD, type FactoryTeam } from '../support/factories';

// The answer with the database away is in app-db-down.test.ts: models bind to one connection
// per process, so that app cannot live in this file.
const { app } = testApp();
let team: FactoryTeam;
let admin: SignedIn;
let viewer: SignedIn;
beforeAll(async () => {
  team = await makeTeam();
  admin = await signIn(app, team.emails.admin, PASSWORD);
  viewer = await signIn(app, team.emails.viewer, PASSWORD);
});

describe('GET /api/health', () => {
  it('answers 200 with the database up, without a session and without making one', async () => {
    const answer = await request(app).get('/api/health');
    expect(answer.status).toBe(200);
    expect(answer.body).toEqual({ status: 'ok', db: 'ok' });
    expect(answer.headers['set-cookie']).toBeUndefined();
  });
});

describe('an unknown API route', () => {
  it('answers 404 not_found signed out', async () => {
    // (Under /api/team and /api/events a signed-out caller gets 401 first: auth guards the area.)
    for (const answer of [await request(app).get('/api/robots'), await request(app).post('/api/robots/7').send({})]) {
      expect(answer.status).toBe(404);
      expect(answer.body).toEqual({ error: { code: 'not_found', message: expect.stringMatching(/^No such API route: (GET|POST) \//) } });
    }
  });

  it('answers 404 not_found signed in, for reads and writes', async () => {
    for (const answer of [await admin.get('/api/robots'), await admin.post('/api/robots', {}), await admin.delete(`/api/events/${team.event.id}`)]) {
      expect(answer.status).toBe(404);
      expect(answer.body.error.code).toBe('not_found');
    }
  });
});

describe('security headers', () => {
  it('are sent on API answers, errors included', async () => {
    for (const answer of [await request(app).get('/api/health'), await request(app).get('/api/robots'), await viewer.get('/api/team')]) {
      expect(answer.headers['x-powered-by']).toBeUndefined();
      expect(answer.headers['x-content-type-options']).toBe('nosniff');
      expect(answer.headers['content-security-policy']).toMatch(/default-src 'self'/);
      // A pit LAN is often plain http: nothing may push the browser to https.
      expect(answer.headers['content-security-policy']).not.toMatch(/upgrade-insecure-requests/);
      expect(answer.headers['strict-transport-security']).toBeUndefined();
    }
  });
});

describe('error answers', () => {
  const STACK = /\bat .+[/\\].+:\d+|node_modules|\.ts:\d+/;

  function expectErrorShape(answer: request.Response) {
    expect(Object.keys(answer.body)).toEqual(['error']);
    const { code, message, fields, ...rest } = answer.body.error;
    expect(rest).toEqual({});
    expect(code).toMatch(/^[a-z_]+$/);
    expect(typeof message).toBe('string');
    if (fields !== undefined) {
      expect(Object.values(fields).every((value) => typeof value === 'string')).toBe(true);
    }
    expect(answer.text).not.toMatch(STACK);
    expect(answer.text).not.toMatch(/stack/i);
  }

  it('all have exactly the shape {error: {code, message[, fields]}} and no stack trace', async () => {
    const json = (client: SignedIn, body: string, contentType = 'application/json') =>
      client.agent.post('/api/events').set('x-csrf-token', client.csrfToken).set('Content-Type', contentType).send(body);
    const answers: [string, number, request.Response][] = [
      ['unauthenticated', 401, await request(app).get('/api/team')],
      ['invalid_credentials', 401, await request(app).post('/api/session').send({ email: team.emails.admin, password: 'wrong-password' })],
      ['invalid', 400, await admin.post('/api/events', { name: '' })],
      ['invalid', 400, await admin.get('/api/events/not-a-uuid')],
      ['malformed_json', 400, await json(admin, '{"name":')],
      ['bad_request', 415, await json(admin, '{}', 'application/json; charset=latin-9')],
      ['too_large', 413, await admin.post('/api/events', { name: 'x'.repeat(1_100_000) })],
      ['forbidden', 403, await viewer.post('/api/events', {})],
      ['csrf', 403, await admin.agent.patch(`/api/events/${team.event.id}`).send({ name: 'No token' })],
      ['not_found', 404, await admin.get('/api/events/00000000-0000-4000-8000-000000000000')],
      ['not_found', 404, await request(app).get('/api/robots')],
      ['already_member', 409, await admin.post('/api/team/members', { name: 'Again', email: team.emails.crew, roles: ['crew'] })],
    ];
    for (const [code, status, answer] of answers) {
      expect([answer.status, answer.body.error?.code], code).toEqual([status, code]);
      expect(answer.headers['content-type']).toMatch(/^application\/json/);
      expectErrorShape(answer);
    }
  });

  it('answers 500 internal for an unexpected failure, logging it but showing no detail', async () => {
    const logged = vi.spyOn(console, 'error').mockImplementation(() => {});
    const failure = new Error('connect ECONNRESET 10.0.0.7:3306 at /srv/pitwright/server/routes/team.ts:19');
    vi.spyOn(Team, 'findByPk').mockRejectedValueOnce(failure);

    const answer = await viewer.get('/api/team');
    expect(answer.status).toBe(500);
    expect(answer.body).toEqual({ error: { code: 'internal', message: 'Something went wrong on the server' } });
    expectErrorShape(answer);
    expect(answer.text).not.toContain('ECONNRESET');
    expect(logged).toHaveBeenCalledTimes(1);
    expect(logged.mock.calls[0]).toContain(failure);
  });
});

describe('a body that is not an object', () => {
  it('answers 400 saying what to send, with no fields to name', async () => {
    const answer = await request(app).post('/api/session').send([1, 2]);
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual({ error: { code: 'invalid', message: 'Send a JSON object as the request body' } });
  });
});
