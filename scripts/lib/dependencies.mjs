import crypto from 'node:crypto';
import fs from 'node:fs';
import { run } from './processes.mjs';
import { step } from './log.mjs';

const STAMP = 'node_modules/.pitwright-installed';

const fingerprint = () =>
  crypto
    .createHash('sha256')
    .update(fs.readFileSync('package.json'))
    .update(fs.existsSync('package-lock.json') ? fs.readFileSync('package-lock.json') : '')
    .digest('hex');

/** Installs npm dependencies when node_modules is missing or was installed from another package.json or lock file. */
export async function ensureDependencies() {
  const wanted = fingerprint();
  if (fs.existsSync(STAMP) && fs.readFileSync(STAMP, 'utf8') === wanted) return;
  step('Installing npm dependencies…');
  await run('npm', fs.existsSync('package-lock.json') ? ['ci', '--no-audit', '--no-fund'] : ['install', '--no-audit', '--no-fund']);
  fs.writeFileSync(STAMP, wanted);
}
