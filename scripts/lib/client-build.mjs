import fs from 'node:fs';
import path from 'node:path';
import { run } from './processes.mjs';
import { step } from './log.mjs';

const INPUTS = ['src', 'shared', 'public', 'index.html', 'vite.config.ts', 'package-lock.json', 'tsconfig.json'];
const OUTPUT = 'dist/index.html';

function newestChange(entry) {
  if (!fs.existsSync(entry)) return 0;
  const stat = fs.statSync(entry);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return Math.max(0, ...fs.readdirSync(entry).map((name) => newestChange(path.join(entry, name))));
}

/** Builds the client when dist/ is missing or older than any of its sources. */
export async function ensureClientBuild() {
  const builtAt = fs.existsSync(OUTPUT) ? fs.statSync(OUTPUT).mtimeMs : 0;
  if (builtAt > Math.max(...INPUTS.map(newestChange))) return;
  step('Building the client…');
  await run(process.execPath, ['node_modules/vite/bin/vite.js', 'build', '--logLevel', 'warn']);
}
