import { useNow } from './use-now';

// A Date header has whole seconds and the answer spent time in flight, so a difference under
// two seconds is noise: following it would make two tablets' countdowns disagree by a second.
const NOISE_MS = 2000;

let offsetMs = 0;

/**
 * Learns the server's clock from an answer's Date header. Tablets in a pit are often minutes
 * off (no network time in the arena), and a queue countdown read from such a clock lies.
 * offset = server time (the header, plus half its one-second resolution) − local time at arrival.
 */
export function noteServerDate(dateHeader: string | null, receivedAtMs = Date.now()): void {
  if (!dateHeader) return;
  const serverMs = Date.parse(dateHeader);
  if (Number.isNaN(serverMs)) return;
  const measured = serverMs + 500 - receivedAtMs;
  offsetMs = Math.abs(measured) < NOISE_MS ? 0 : measured;
}

/** Milliseconds to add to the device clock to read the server's. */
export function serverClockOffsetMs(): number {
  return offsetMs;
}

/** The server's "now", from the device clock corrected by the last known offset. */
export function serverNow(): Date {
  return new Date(Date.now() + offsetMs);
}

/** `useNow`, corrected to the server's clock: what countdowns to queue calls are read against. */
export function useServerNow(intervalMs = 1000): Date {
  const deviceNow = useNow(intervalMs);
  return new Date(deviceNow.getTime() + offsetMs);
}
