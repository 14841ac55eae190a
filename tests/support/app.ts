import { afterAll } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { ROLES, type Role } from '../../shared/roles';
import { createSequelize } from '../../server/db/sequelize';

/**
 * One app per test file on the real test database (prepared by `npm test`). Files share the
 * database, so every test makes its own team with factories and never assumes an empty table.
 */
export function testApp(overrides: NodeJS.ProcessEnv = {}) {
  if (!process.env.DATABASE_URL) throw new Error('Run the API tests through `npm test`, which prepares the test database');
  const config = loadConfig({ ...process.env, ...overrides });
  const sequelize = createSequelize(config.databaseUrl);
  const built = createApp({ config, sequelize });
  afterAll(async () => {
    built.close();
    await sequelize.close();
  });
  return { ...built, sequelize, config };
}

export type TestApp = ReturnType<typeof testApp>;

/** A signed-in browser-like client: keeps the cookie and sends the CSRF token on writes. */
export async function signIn(app: TestApp['app'], email: string, password: string) {
  const agent = request.agent(app);
  const answer = await agent.post('/api/session').send({ email, password });
  if (answer.status !== 200) throw new Error(`Sign-in as ${email} failed: ${answer.status} ${JSON.stringify(answer.body)}`);
  const csrfToken: string = answer.body.csrfToken;
  const write = (method: 'post' | 'put' | 'patch' | 'delete', url: string) => agent[method](url).set('x-csrf-token', csrfToken);
  return {
    agent,
    csrfToken,
    session: answer.body,
    get: (url: string) => agent.get(url),
    post: (url: string, body?: object) => write('post', url).send(body),
    put: (url: string, body?: object) => write('put', url).send(body),
    patch: (url: string, body?: object) => write('patch', url).send(body),
    delete: (url: string) => write('delete', url),
  };
}
export type SignedIn = Awaited<ReturnType<typeof signIn>>;

/** One signed-in client per role, e.g. for a factory team's `emails`. */
export async function signInEveryRole(app: TestApp['app'], emails: Record<Role, string>, password: string) {
  const clients = {} as Record<Role, SignedIn>;
  for (const role of ROLES) clients[role] = await signIn(app, emails[role], password);
  return clients;
}
