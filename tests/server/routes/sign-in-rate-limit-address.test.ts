import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../support/app';
import { makeTeam, PASSWORD, uniqueEmail } from '../../support/factories';

// A file of its own: its app's limiter has seen no other failures from this address.
const { app } = testApp();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

const signInWith = (email: string, password: string) => request(app).post('/api/session').send({ email, password });

describe('POST /api/session: failed sign-ins per client address', () => {
  it('answers 429 after 100 failures from one address, whatever the e-mail', async () => {
    // A different e-mail each time, so the per-e-mail limit (10) never applies.
    for (let attempt = 1; attempt <= 100; attempt++) {
      const answer = await signInWith(uniqueEmail(`guess${attempt}`), 'not-the-password');
      expect(answer.status, `attempt ${attempt}`).toBe(401);
    }
    const blocked = await signInWith(uniqueEmail('guess101'), 'not-the-password');
    expect(blocked.status).toBe(429);
    expect(blocked.headers['retry-after']).toMatch(/^[1-9]\d*$/);
    expect(blocked.body).toEqual({ error: { code: 'rate_limited', message: expect.stringMatching(/^Too many failed sign-ins/) } });

    // A real member with the right password, from the same address, is refused too.
    const member = await signInWith(team.emails.lead, PASSWORD);
    expect(member.status).toBe(429);
    expect(member.body.error.code).toBe('rate_limited');
  });
});
