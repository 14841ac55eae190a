import fs from 'node:fs';
import { run } from './processes.mjs';
import { SetupError, step } from './log.mjs';

let aptUpdated = false;

/**
 * Makes sure a Debian package that provides `binary` is installed: installs it with apt-get when
 * we are root, otherwise says exactly what to run. Answers the binary's full path, since a
 * user's PATH often lacks /usr/sbin.
 */
export async function ensureDebianPackage({ binary, pkg, why }) {
  const candidates = binary.startsWith('/') ? [binary] : ['/usr/sbin', '/usr/bin', '/sbin', '/bin'].map((dir) => `${dir}/${binary}`);
  const found = () => candidates.find((file) => fs.existsSync(file));
  if (found()) return found();
  if (process.getuid?.() !== 0) {
    throw new SetupError(`${why} needs ${binary}. Install it once with:\n    sudo apt-get update && sudo apt-get install -y ${pkg}`);
  }
  step(`Installing ${pkg} from Debian's packages (${why})…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    await run('apt-get', ['update', '-qq'], { env, quiet: true });
    aptUpdated = true;
  }
  await run('apt-get', ['install', '-y', '-qq', '--no-install-recommends', pkg], { env, quiet: true });
  if (!found()) throw new SetupError(`Installed ${pkg}, yet ${binary} is still missing`);
  return found();
}
