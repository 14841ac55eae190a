import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll } from 'vitest';
import { io as connect, type ManagerOptions, type Socket, type SocketOptions } from 'socket.io-client';
import { attachRealtime } from '../../server/realtime/io';
import { testApp, type SignedIn } from './app';

/** The app with Socket.IO on a free loopback port, and ways to open sockets as a tablet or a pit screen. */
export function realtimeHarness() {
  const built = testApp();
  const harness = { baseUrl: '', sockets: [] as Socket[] };
  beforeAll(async () => {
    const server = built.app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const io = attachRealtime(server, built);
    harness.baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    afterAll(async () => {
      for (const socket of harness.sockets) socket.disconnect();
      await io.close();
    });
  });

  // Resolves once connected or refused.
  function connectWith(options: Partial<ManagerOptions & SocketOptions>) {
    const socket = connect(harness.baseUrl, { transports: ['websocket'], reconnection: false, ...options });
    harness.sockets.push(socket);
    return new Promise<{ socket: Socket; error?: Error }>((resolve) => {
      socket.once('connect', () => resolve({ socket }));
      socket.once('connect_error', (error) => resolve({ socket, error }));
    });
  }
  /** A tablet's socket, with the given cookie header (or none). */
  const open = (cookie?: string) => connectWith({ extraHeaders: cookie ? { cookie } : {} });
  /** A socket as the pit screen opens it: its token, no cookie. */
  const openScreen = (screenToken: unknown) => connectWith({ auth: { screenToken } });
  return { ...built, harness, open, openScreen };
}

/** The session cookie a signed-in test client holds, as a Cookie header. */
export async function cookieOf(client: SignedIn) {
  const answer = await client.get('/api/session');
  return ([] as string[]).concat(answer.headers['set-cookie'] ?? []).map((cookie) => cookie.split(';')[0]).join('; ');
}

/** The next `name` event on the socket; fails after 5 s. */
export const nextEvent = (socket: Socket, name: string) =>
  new Promise<unknown>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`no ${name} arrived`)), 5_000);
    socket.once(name, (payload: unknown) => {
      clearTimeout(timer);
      resolve(payload);
    });
  });
