import { beforeAll, expect, it } from 'vitest';
import { signIn, testApp } from '../../support/app';
import { makeTeam, PASSWORD } from '../../support/factories';

const { app } = testApp();
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

it('after 10 wrong current passwords for one account, answers 429 even for the right one; other accounts are unaffected', async () => {
  const tablet = await signIn(app, team.emails.crew, PASSWORD);
  for (let attempt = 1; attempt <= 10; attempt++) {
    const wrong = await tablet.put('/api/session/password', { currentPassword: `guess-${attempt}`, newPassword: 'a-new-password-1' });
    expect(wrong.status).toBe(400);
  }
  const limited = await tablet.put('/api/session/password', { currentPassword: PASSWORD, newPassword: 'a-new-password-1' });
  expect(limited.status).toBe(429);
  expect(Number(limited.headers['retry-after'])).toBeGreaterThan(0);
  expect(limited.body.error).toEqual({ code: 'rate_limited', message: 'Too many wrong passwords: try again in 15 min' });

  const other = await signIn(app, team.emails.lead, PASSWORD);
  const changed = await other.put('/api/session/password', { currentPassword: PASSWORD, newPassword: 'a-new-password-1' });
  expect(changed.status).toBe(204);
});
