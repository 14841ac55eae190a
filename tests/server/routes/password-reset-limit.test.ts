import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { RESET_REQUESTS_PER_ADDRESS } from '../../../server/auth/failure-limits';
import { testApp } from '../../support/app';
import { uniqueEmail } from '../../support/factories';

// Limiter state lives in the app: this file's app is its own, so no other test counts toward it.
const { app } = testApp();

describe('POST /api/session/password-reset: requests per client address', () => {
  it(`answers 429 with Retry-After after ${RESET_REQUESTS_PER_ADDRESS} requests within the hour`, async () => {
    for (let attempt = 1; attempt <= RESET_REQUESTS_PER_ADDRESS; attempt++) {
      const answer = await request(app).post('/api/session/password-reset').send({ email: uniqueEmail('limit') });
      expect(answer.status, `request ${attempt}`).toBe(202);
    }
    const limited = await request(app).post('/api/session/password-reset').send({ email: uniqueEmail('limit') });
    expect(limited.status).toBe(429);
    expect(limited.headers['retry-after']).toMatch(/^[1-9]\d*$/);
    expect(limited.body).toEqual({
      error: { code: 'rate_limited', message: expect.stringMatching(/^Too many password reset requests: try again in [1-9]\d* min$/) },
    });
  });
});
