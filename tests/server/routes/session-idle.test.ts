import { beforeAll, expect, it } from 'vitest';
import { SessionRecord } from '../../../server/models';
import { signIn, testApp } from '../../support/app';
import { makeTeam, PASSWORD } from '../../support/factories';

// The idle timeout is a setting: 3 hours here instead of the default 12.
const { app } = testApp({ SESSION_IDLE_HOURS: '3' });
let team: Awaited<ReturnType<typeof makeTeam>>;
beforeAll(async () => {
  team = await makeTeam();
});

it('sets the cookie and the stored row to expire after the configured idle time, renewed on each request', async () => {
  const client = await signIn(app, team.emails.crew, PASSWORD);
  const answer = await client.get('/api/session');
  const cookie = ([] as string[]).concat(answer.headers['set-cookie']).join(';');
  const expires = Date.parse(/Expires=([^;]+)/.exec(cookie)![1]);
  expect((expires - Date.now()) / 3_600_000).toBeCloseTo(3, 1);
  const row = await SessionRecord.findOne({ where: { userId: answer.body.user.id }, order: [['updatedAt', 'DESC']] });
  const hoursLeft = (row!.expires!.getTime() - Date.now()) / 3_600_000;
  expect(hoursLeft).toBeGreaterThan(2.9);
  expect(hoursLeft).toBeLessThanOrEqual(3);
});

it('treats a session whose idle time ran out as signed out, even before the cleanup pass removes it', async () => {
  const client = await signIn(app, team.emails.viewer, PASSWORD);
  const userId = client.session.user.id;
  await SessionRecord.update({ expires: new Date(Date.now() - 1000) }, { where: { userId } });
  const answer = await client.get('/api/session');
  expect(answer.status).toBe(401);
});
