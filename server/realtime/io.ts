import type { Server as HttpServer, IncomingMessage, ServerResponse } from 'node:http';
import type { Request } from 'express';
import { Server } from 'socket.io';
import type { createApp } from '../app';
import { attachBroadcaster, eventRoom, teamRoom } from './broadcast';

type Middleware = (req: IncomingMessage, res: ServerResponse, next: (error?: unknown) => void) => void;

// Session and passport run once, on the handshake; later HTTP long-polling requests of the
// same connection carry its `sid` and need neither.
const onlyForHandshake =
  (middleware: unknown): Middleware =>
  (req, res, next) => {
    const isHandshake = (req as IncomingMessage & { _query: Record<string, string> })._query.sid === undefined;
    if (isHandshake) (middleware as Middleware)(req, res, next);
    else next();
  };

/**
 * Socket.IO on the app's HTTP server, signed in by the same session cookie: no session, no
 * socket. Each socket joins its team's room and the room of the team's current event.
 */
export function attachRealtime(httpServer: HttpServer, { sessionMiddleware, passport }: ReturnType<typeof createApp>) {
  const io = new Server(httpServer, { serveClient: false });
  io.engine.use(onlyForHandshake(sessionMiddleware));
  io.engine.use(onlyForHandshake(passport.initialize()));
  io.engine.use(onlyForHandshake(passport.session()));
  io.use((socket, next) => {
    const req = socket.request as Request;
    const memberships = req.user?.memberships ?? [];
    const membership = memberships.find((m) => m.teamId === req.session?.activeTeamId) ?? memberships[0];
    if (!membership) return next(new Error('unauthenticated'));
    void socket.join(teamRoom(membership.teamId));
    if (membership.team?.currentEventId) void socket.join(eventRoom(membership.team.currentEventId));
    next();
  });
  attachBroadcaster(io);
  return io;
}
