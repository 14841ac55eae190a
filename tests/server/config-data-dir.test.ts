import path from 'node:path';
import { expect, it } from 'vitest';
import { loadConfig } from '../../server/config';

const base = { SESSION_SECRET: 'a-secret-long-enough-1' };

it('keeps uploads under DATA_DIR (./data by default), outside the client folder', () => {
  const defaults = loadConfig(base);
  expect(defaults.dataDir).toBe(path.resolve('data'));
  expect(defaults.uploadsDir).toBe(path.resolve('data', 'uploads'));
  const moved = loadConfig({ ...base, DATA_DIR: '/srv/pitwright' });
  expect([moved.dataDir, moved.uploadsDir]).toEqual(['/srv/pitwright', '/srv/pitwright/uploads']);
  expect(moved.uploadsDir.startsWith(moved.clientDir)).toBe(false);
});
