/** One voice for the set-up scripts: short lines a newcomer can follow. */
export const step = (message) => console.log(`\x1b[36m›\x1b[0m ${message}`);
export const warn = (message) => console.log(`\x1b[33m!\x1b[0m ${message}`);

export class SetupError extends Error {}

/** Prints a set-up failure (a SetupError without its stack trace) and sets a failing exit code. */
export function fail(error) {
  if (error instanceof SetupError) console.error(`\x1b[31m✗\x1b[0m ${error.message}`);
  else console.error(error);
  process.exitCode = 1;
}
