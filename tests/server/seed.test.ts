import { expect, it } from 'vitest';
import { User } from '../../server/models';
import { demoEmail, seedDemo } from '../../server/db/seed/demo';
import { testApp } from '../support/app';

testApp();

it('refuses to seed the demo accounts with NODE_ENV=production, and writes nothing', async () => {
  await expect(seedDemo({ env: 'production' })).rejects.toThrow('Refusing to seed demo accounts with NODE_ENV=production');
  expect(await User.count({ where: { email: demoEmail('admin') } })).toBe(0);
});
