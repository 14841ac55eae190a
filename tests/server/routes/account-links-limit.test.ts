import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { MAX_FAILURES_PER_EMAIL } from '../../../server/auth/failure-limits';
import { signIn, testApp } from '../../support/app';
import { makeTeamWithoutEvent, PASSWORD } from '../../support/factories';
import { linkTokenIn, waitForMailTo } from '../../support/mail';

// Limiter state lives in the app: this file's app is its own.
const { app } = testApp();
let token: string;
let existing: string;
beforeAll(async () => {
  const inviting = await makeTeamWithoutEvent();
  const elsewhere = await makeTeamWithoutEvent();
  existing = elsewhere.emails.crew;
  const admin = await signIn(app, inviting.emails.admin, PASSWORD);
  await admin.post('/api/team/invites', { name: 'Mary Jackson', email: existing, roles: ['crew'] });
  token = linkTokenIn((await waitForMailTo(existing))[0].text);
});

describe('POST /api/account-links/use: wrong passwords per link', () => {
  it(`answers 429 after ${MAX_FAILURES_PER_EMAIL} wrong passwords, then refuses even the right one`, async () => {
    for (let attempt = 1; attempt <= MAX_FAILURES_PER_EMAIL; attempt++) {
      const answer = await request(app).post('/api/account-links/use').send({ token, password: `wrong-password-${attempt}` });
      expect(answer.status, `attempt ${attempt}`).toBe(400);
    }
    const limited = await request(app).post('/api/account-links/use').send({ token, password: PASSWORD });
    expect(limited.status).toBe(429);
    expect(limited.body).toEqual({
      error: { code: 'rate_limited', message: expect.stringMatching(/^Too many failed attempts: try again in [1-9]\d* min$/) },
    });
  });
});
