/**
 * `npm run bench`: request rates and latencies of the main read paths against a running
 * Pitwright (`npm start` first). Prints figures; asserts nothing. Loopback only.
 *   BENCH_URL (default http://127.0.0.1:5180), BENCH_SECONDS (default 5), BENCH_CONNECTIONS (20)
 */
import autocannon from 'autocannon';

const baseUrl = process.env.BENCH_URL ?? 'http://127.0.0.1:5180';
const duration = Number(process.env.BENCH_SECONDS ?? 5);
const connections = Number(process.env.BENCH_CONNECTIONS ?? 20);
if (!/^http:\/\/(127\.\d+\.\d+\.\d+|localhost|\[::1\])(:\d+)?$/.test(baseUrl)) {
  throw new Error('BENCH_URL must be a loopback address');
}

const signIn = await fetch(`${baseUrl}/api/session`, {
  method: 'POST',
  headers: { 'content-type': 'application/json' },
  body: JSON.stringify({ email: 'viewer@demo.pitwright.test', password: 'pitwright-demo' }),
});
if (!signIn.ok) throw new Error(`Sign-in as the demo viewer failed (${signIn.status}): is npm start running with the demo?`);
const cookie = signIn.headers.getSetCookie().map((value) => value.split(';')[0]).join('; ');

const paths = ['/api/health', '/api/session', '/api/team', '/api/team/members', '/api/events'];
console.log(`${connections} connections, ${duration} s per path, against ${baseUrl}\n`);
console.log('path                     req/s    p50 ms   p99 ms   non-2xx');
for (const path of paths) {
  const result = await autocannon({ url: `${baseUrl}${path}`, connections, duration, headers: { cookie } });
  const row = [path.padEnd(22), String(Math.round(result.requests.average)).padStart(7), String(result.latency.p50).padStart(9), String(result.latency.p99).padStart(8), String(result.non2xx).padStart(9)];
  console.log(row.join(' '));
}
