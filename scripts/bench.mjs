/**
 * `npm run bench`: figures, no assertions. Six parts:
 *  1. the timeline computation for 200 matches (median time per call, in-process);
 *  2. the battery rotation plan for 150 matches × 24 batteries × 6 bays, and with each doubled (in-process);
 *  3. request rates and latencies of the main reads against a running Pitwright (`npm start`);
 *  4. fan-out: from a field mark to its receipt on 50 connected sockets (p50, p95, p99);
 *  5. the repair board: its read at 20 connections, and card moves one after another (write → answer);
 *  6. the safety log: its read and its CSV export at 20 connections, as the safety captain (reads only:
 *     a safety log keeps every report, so the bench adds none).
 * Loopback only. BENCH_URL (default http://127.0.0.1:5180), BENCH_SECONDS (5), BENCH_CONNECTIONS (20).
 * BENCH_ONLY picks parts by name (timeline, plan, reads, fanout, repairs, incidents; comma-separated): `BENCH_ONLY=plan
 * npm run bench` needs no server. Part 4 marks the demo's next match and undoes it again, and part 5
 * moves a demo card back and forth an even number of times, so the data ends as it began (but for
 * the card's version and history).
 */
import autocannon from 'autocannon';
import { io } from 'socket.io-client';
import { planBatteries } from '../shared/domain/battery-plan.ts';
import { BATTERY_DEFAULTS } from '../shared/domain/battery-state.ts';
import { computeTimeline, TIMELINE_DEFAULTS } from '../shared/domain/timeline.ts';

const baseUrl = process.env.BENCH_URL ?? 'http://127.0.0.1:5180';
const duration = Number(process.env.BENCH_SECONDS ?? 5);
const connections = Number(process.env.BENCH_CONNECTIONS ?? 20);
if (!/^http:\/\/(127\.\d+\.\d+\.\d+|localhost|\[::1\])(:\d+)?$/.test(baseUrl)) {
  throw new Error('BENCH_URL must be a loopback address');
}

const only = process.env.BENCH_ONLY?.split(',').map((part) => part.trim());
const runs = (part) => !only || only.includes(part);

const percentile = (sorted, p) => sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
const ms = (value) => value.toFixed(value < 1 ? 3 : 1);

function benchTimeline() {
  const start = Date.parse('2027-03-05T15:00:00Z');
  const matches = Array.from({ length: 200 }, (_, i) => ({
    id: `m${i + 1}`,
    level: 'qualification',
    number: i + 1,
    scheduledStart: new Date(start + i * 7 * 60_000).toISOString(),
    startedAt: i < 60 ? new Date(start + i * 7.3 * 60_000).toISOString() : null,
    red: [20001 + i, 20201 + i, 20401 + i],
    blue: i % 7 === 0 ? [28417, 20601 + i, 20801 + i] : [20601 + i, 20801 + i, 21001 + i],
  }));
  const settings = { ...TIMELINE_DEFAULTS, teamNumber: 28417 };
  const now = new Date(start + 61 * 7.3 * 60_000);
  for (let i = 0; i < 200; i++) computeTimeline(matches, settings, now); // warm-up
  const times = [];
  for (let i = 0; i < 1000; i++) {
    const t0 = performance.now();
    computeTimeline(matches, settings, now);
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  console.log(`timeline, 200 matches: median ${ms(percentile(times, 50))} ms per call, p99 ${ms(percentile(times, 99))} ms (1000 calls)\n`);
}

/** A made-up but busy weekend: our queue calls 8 min apart, a fleet in every state, 6 A bays. */
function planInput(matchCount, batteryCount, bayCount) {
  const now = Date.parse('2027-03-05T15:00:00Z');
  const at = (minutes) => new Date(now + minutes * 60_000).toISOString();
  const health = ['good', 'good', 'good', 'watch', 'good', 'replace'];
  return {
    now: at(0),
    batteries: Array.from({ length: batteryCount }, (_, i) => ({
      id: `battery-${i}`,
      label: `B${String(i + 1).padStart(2, '0')}`,
      status: i % 11 === 10 ? 'retired' : i % 4 === 1 ? 'charging' : 'ready',
      health: health[i % health.length],
      ratedAh: 18,
      stateOfChargePercent: i % 5 === 4 ? null : 60 + ((i * 37) % 41),
      chargingUntil: i % 4 === 1 && i < bayCount * 4 ? at(10 + i) : null,
      chargingBay: i % 4 === 1 && i < bayCount * 4 ? Math.floor(i / 4) + 1 : null,
      installedForMatchId: i === 0 ? 'match-1' : null,
      usesThisEvent: (i * 7) % 5,
    })),
    bays: Array.from({ length: bayCount }, (_, i) => ({ bay: i + 1, chargerId: `charger-${Math.floor(i / 3)}`, label: `bay ${i + 1}`, currentA: 6 })),
    matches: Array.from({ length: matchCount }, (_, i) => ({ matchId: `match-${i + 1}`, queueAt: at(5 + i * 8), projectedStart: at(15 + i * 8) })),
    outOfRobotAfterMinutes: 2.5 + 3,
    drawPercent: 6.3,
    minimumStartChargePercent: BATTERY_DEFAULTS.minimumStartChargePercent,
    chargeFactor: BATTERY_DEFAULTS.chargeFactor,
    chargeTailMinutes: BATTERY_DEFAULTS.chargeTailMinutes,
  };
}

function benchPlan() {
  const cases = [
    ['150 matches × 24 batteries × 6 bays', planInput(150, 24, 6)],
    ['300 matches (doubled)', planInput(300, 24, 6)],
    ['48 batteries (doubled)', planInput(150, 48, 6)],
    ['12 bays (doubled)', planInput(150, 24, 12)],
  ];
  // Warm every case up first, so the first one measured does not pay for the compiler alone.
  for (const [, input] of cases) for (let i = 0; i < 200; i++) planBatteries(input);
  let base = null;
  console.log('battery rotation plan: median per call over 500 calls');
  for (const [name, input] of cases) {
    const times = [];
    for (let i = 0; i < 500; i++) {
      const t0 = performance.now();
      planBatteries(input);
      times.push(performance.now() - t0);
    }
    times.sort((a, b) => a - b);
    const median = percentile(times, 50);
    base ??= median;
    const growth = median === base ? '' : `   ×${(median / base).toFixed(2)} the first`;
    const plan = planBatteries(input);
    const short = plan.warnings.filter((warning) => warning.code === 'no_battery_ready').length;
    console.log(`  ${name.padEnd(38)} median ${ms(median)} ms, p99 ${ms(percentile(times, 99))} ms (${plan.assignments.length} assigned, ${short} short)${growth}`);
  }
  console.log('');
}

async function signIn(role) {
  const answer = await fetch(`${baseUrl}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: `${role}@demo.pitwright.test`, password: 'pitwright-demo' }),
  });
  if (!answer.ok) throw new Error(`Sign-in as the demo ${role} failed (${answer.status}): is npm start running with the demo?`);
  const cookie = answer.headers.getSetCookie().map((value) => value.split(';')[0]).join('; ');
  return { cookie, csrfToken: (await answer.json()).csrfToken };
}

async function benchReads(cookie) {
  const paths = ['/api/health', '/api/session', '/api/team', '/api/team/members', '/api/events'];
  console.log(`reads: ${connections} connections, ${duration} s per path`);
  console.log('path                     req/s    p50 ms   p99 ms   non-2xx');
  for (const path of paths) {
    const result = await autocannon({ url: `${baseUrl}${path}`, connections, duration, headers: { cookie } });
    const row = [path.padEnd(22), String(Math.round(result.requests.average)).padStart(7), String(result.latency.p50).padStart(9), String(result.latency.p99).padStart(8), String(result.non2xx).padStart(9)];
    console.log(row.join(' '));
  }
  console.log('');
}

async function benchFanOut(viewer, lead, { clients = 50, writes = 20 } = {}) {
  const get = (path, session) => fetch(`${baseUrl}${path}`, { headers: { cookie: session.cookie } }).then((r) => r.json());
  const send = (method, path, body) =>
    fetch(`${baseUrl}${path}`, {
      method,
      headers: { cookie: lead.cookie, 'x-csrf-token': lead.csrfToken, 'content-type': 'application/json' },
      body: body && JSON.stringify(body),
    });
  const event = (await get('/api/events', lead)).find((each) => each.current);
  const next = (await get(`/api/events/${event.id}/matches`, lead)).find((match) => match.startedAt === null);
  if (!next) throw new Error('No unstarted match in the current event to mark');

  const sockets = await Promise.all(
    Array.from({ length: clients }, () => {
      const socket = io(baseUrl, { transports: ['websocket'], extraHeaders: { cookie: viewer.cookie }, reconnection: false });
      return new Promise((resolve, reject) => {
        socket.once('connect', () => resolve(socket));
        socket.once('connect_error', reject);
      });
    }),
  );
  const latencies = [];
  for (let write = 0; write < writes; write++) {
    const arrivals = sockets.map((socket) => new Promise((resolve) => socket.once('field:progressed', () => resolve(performance.now()))));
    const sentAt = performance.now();
    const answer = write % 2 === 0 ? await send('POST', `/api/events/${event.id}/field-progress`, { matchId: next.id }) : await send('DELETE', `/api/events/${event.id}/field-progress/latest`);
    if (!answer.ok) throw new Error(`The field mark failed (${answer.status})`);
    for (const arrivedAt of await Promise.all(arrivals)) latencies.push(arrivedAt - sentAt);
  }
  if (writes % 2 === 1) await send('DELETE', `/api/events/${event.id}/field-progress/latest`);
  for (const socket of sockets) socket.disconnect();
  latencies.sort((a, b) => a - b);
  console.log(`fan-out: ${writes} field marks to ${clients} sockets, write sent → event received`);
  console.log(`  p50 ${ms(percentile(latencies, 50))} ms   p95 ${ms(percentile(latencies, 95))} ms   p99 ${ms(percentile(latencies, 99))} ms   (${latencies.length} receipts)`);
}

if (runs('timeline')) benchTimeline();
if (runs('plan')) benchPlan();
async function benchRepairs(crew, { moves = 40 } = {}) {
  const get = (path) => fetch(`${baseUrl}${path}`, { headers: { cookie: crew.cookie } }).then((r) => r.json());
  const event = (await get('/api/events')).find((each) => each.current);
  const path = `/api/events/${event.id}/repairs`;
  const board = await autocannon({ url: `${baseUrl}${path}`, connections, duration, headers: { cookie: crew.cookie } });
  const { repairs } = await get(path);
  console.log(`repairs: the board of ${repairs.length} tickets, ${connections} connections, ${duration} s`);
  console.log(`  ${Math.round(board.requests.average)} req/s, p50 ${board.latency.p50} ms, p99 ${board.latency.p99} ms, ${board.non2xx} non-2xx`);

  const card = repairs.find((repair) => repair.status === 'reported');
  if (!card) throw new Error('No reported card on the demo board to move');
  let version = card.version;
  const latencies = [];
  for (let move = 0; move < moves; move++) {
    const status = move % 2 === 0 ? 'in_progress' : 'reported';
    const sentAt = performance.now();
    const answer = await fetch(`${baseUrl}/api/repairs/${card.id}`, {
      method: 'PATCH',
      headers: { cookie: crew.cookie, 'x-csrf-token': crew.csrfToken, 'content-type': 'application/json' },
      body: JSON.stringify({ status, version }),
    });
    if (!answer.ok) throw new Error(`Moving the card failed (${answer.status})`);
    version = (await answer.json()).version;
    latencies.push(performance.now() - sentAt);
  }
  latencies.sort((a, b) => a - b);
  console.log(`  ${moves} card moves one after another: p50 ${ms(percentile(latencies, 50))} ms, p99 ${ms(percentile(latencies, 99))} ms\n`);
}

async function benchIncidents(safety) {
  const log = await fetch(`${baseUrl}/api/incidents`, { headers: { cookie: safety.cookie } }).then((r) => r.json());
  console.log(`incidents: the log of ${log.incidents.length} reports, ${connections} connections, ${duration} s per path`);
  for (const path of ['/api/incidents', '/api/incidents.csv']) {
    const result = await autocannon({ url: `${baseUrl}${path}`, connections, duration, headers: { cookie: safety.cookie } });
    console.log(`  ${path.padEnd(20)} ${Math.round(result.requests.average)} req/s, p50 ${result.latency.p50} ms, p99 ${result.latency.p99} ms, ${result.non2xx} non-2xx`);
  }
  console.log('');
}

if (runs('reads') || runs('fanout')) {
  const viewer = await signIn('viewer');
  if (runs('reads')) await benchReads(viewer.cookie);
  if (runs('fanout')) await benchFanOut(viewer, await signIn('lead'));
}
if (runs('repairs')) await benchRepairs(await signIn('crew'));
if (runs('incidents')) await benchIncidents(await signIn('safety'));
