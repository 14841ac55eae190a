import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll } from 'vitest';
import { io as connect, type Socket } from 'socket.io-client';
import { attachRealtime } from '../../server/realtime/io';
import { testApp } from './app';

/** The app with Socket.IO on a free loopback port, and a way to open sockets as a signed-in agent. */
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

  /** Opens a socket with the given cookie header (or none); resolves once connected or refused. */
  function open(cookie?: string) {
    const socket = connect(harness.baseUrl, { transports: ['websocket'], extraHeaders: cookie ? { cookie } : {}, reconnection: false });
    harness.sockets.push(socket);
    return new Promise<{ socket: Socket; error?: Error }>((resolve) => {
      socket.once('connect', () => resolve({ socket }));
      socket.once('connect_error', (error) => resolve({ socket, error }));
    });
  }
  return { ...built, harness, open };
}
