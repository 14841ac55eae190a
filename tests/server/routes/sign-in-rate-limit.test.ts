import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../support/app';
import { makeTeam, PASSWORD } from '../../support/factories';

// Limiter state lives in the app: this file's app is its own. The per-address limit is in
// sign-in-rate-limit-address.test.ts so that these failures do not count toward it.
const { app } = testApp();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

const signInWith = (email: string, password: string) => request(app).post('/api/session').send({ email, password });
const WRONG = 'not-the-password';
const INVALID_CREDENTIALS = { error: { code: 'invalid_credentials', message: 'Wrong e-mail or password' } };

function expectRateLimited(answer: request.Response) {
  expect(answer.status).toBe(429);
  expect(answer.headers['retry-after']).toMatch(/^[1-9]\d*$/);
  expect(answer.body).toEqual({
    error: { code: 'rate_limited', message: expect.stringMatching(/^Too many failed sign-ins: try again in [1-9]\d* min$/) },
  });
  expect(answer.headers['set-cookie']).toBeUndefined();
}

describe('POST /api/session: failed sign-ins per e-mail', () => {
  it('answers 429 with Retry-After at the 11th failure, then refuses even the right password', async () => {
    const email = team.emails.crew;
    for (let attempt = 1; attempt <= 10; attempt++) {
      const answer = await signInWith(email, WRONG);
      expect(answer.status, `attempt ${attempt}`).toBe(401);
      expect(answer.body).toEqual(INVALID_CREDENTIALS);
    }
    expectRateLimited(await signInWith(email, WRONG));
    expectRateLimited(await signInWith(email, PASSWORD));
    // Case and spaces do not make it another e-mail.
    expectRateLimited(await signInWith(`  ${email.toUpperCase()} `, PASSWORD));
  });

  it('still lets another e-mail sign in from the same address', async () => {
    const answer = await signInWith(team.emails.lead, PASSWORD);
    expect(answer.status).toBe(200);
    expect(answer.body.user.email).toBe(team.emails.lead);
  });

  it('does not count successful sign-ins', async () => {
    for (let attempt = 1; attempt <= 12; attempt++) {
      const answer = await signInWith(team.emails.viewer, PASSWORD);
      expect(answer.status, `sign-in ${attempt}`).toBe(200);
    }
  });

  it('counts only the failures when successes come in between', async () => {
    const email = team.emails.battery;
    for (let attempt = 1; attempt <= 9; attempt++) expect((await signInWith(email, WRONG)).status).toBe(401);
    for (let attempt = 1; attempt <= 3; attempt++) expect((await signInWith(email, PASSWORD)).status).toBe(200);
    expect((await signInWith(email, WRONG)).status).toBe(401); // the 10th failure
    expectRateLimited(await signInWith(email, WRONG)); // the 11th
  });
});
