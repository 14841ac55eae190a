import { afterEach, vi } from 'vitest';

// A server error logged during a test is a failed test, even when the answer looked right.
const errors: unknown[][] = [];
const original = console.error;
console.error = (...args: unknown[]) => {
  errors.push(args);
  original(...args);
};

afterEach(() => {
  const logged = errors.splice(0);
  vi.restoreAllMocks();
  if (logged.length) throw new Error(`console.error was called:\n${logged.map((args) => args.join(' ')).join('\n')}`);
});
