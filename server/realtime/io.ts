import type { Server as HttpServer, IncomingMessage, ServerResponse } from 'node:http';
import type { Request } from 'express';
import { Server, type Socket } from 'socket.io';
import { can } from '../../shared/roles';
import type { createApp } from '../app';
import { ScreenToken, Team } from '../models';
import { attachBroadcaster, eventRoom, incidentsRoom, screenRoom, sessionRoom, teamRoom, teamScreensRoom } from './broadcast';

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
 * A pit screen's socket (`auth: {screenToken}`): it joins the room of its team's current event,
 * its own room (dropped when revoked) and its team's screens room, never the team room.
 */
async function joinAsScreen(socket: Socket, token: string) {
  const screen = await ScreenToken.active(token);
  if (!screen) throw new Error('unauthenticated');
  const team = await Team.findByPk(screen.teamId, { rejectOnEmpty: true });
  await socket.join([screenRoom(screen.id), teamScreensRoom(team.id)]);
  if (team.currentEventId) await socket.join(eventRoom(team.currentEventId));
  // A revocation that committed while this socket was joining found it in no room yet: look again.
  await screen.reload();
  if (screen.revokedAt) throw new Error('unauthenticated');
}

/**
 * Socket.IO on the app's HTTP server, signed in by the same session cookie: no session, no
 * socket. Each socket joins its team's room and the room of the team's current event, and for
 * safety captains and mentors the team's incidents room. A pit screen signs in with its token
 * instead (see joinAsScreen).
 */
export function attachRealtime(httpServer: HttpServer, { sessionMiddleware, passport }: ReturnType<typeof createApp>) {
  const io = new Server(httpServer, { serveClient: false });
  io.engine.use(onlyForHandshake(sessionMiddleware));
  io.engine.use(onlyForHandshake(passport.initialize()));
  io.engine.use(onlyForHandshake(passport.session()));
  io.use((socket, next) => {
    const screenToken: unknown = socket.handshake.auth?.screenToken;
    if (screenToken === undefined) return next();
    if (typeof screenToken !== 'string') return next(new Error('unauthenticated'));
    joinAsScreen(socket, screenToken).then(
      () => {
        socket.data.screen = true;
        next();
      },
      (error: unknown) => {
        const refused = error instanceof Error && error.message === 'unauthenticated';
        if (!refused) console.error('[socket screen sign-in]', error);
        next(new Error(refused ? 'unauthenticated' : 'unavailable'));
      },
    );
  });
  io.use((socket, next) => {
    if (socket.data.screen) return next();
    const req = socket.request as Request;
    const memberships = req.user?.memberships ?? [];
    const membership = memberships.find((m) => m.teamId === req.session?.activeTeamId) ?? memberships[0];
    if (!membership) return next(new Error('unauthenticated'));
    // Its session's room: a sign-out, a team switch or a deactivation closes this socket too.
    void socket.join([teamRoom(membership.teamId), sessionRoom(req.sessionID)]);
    if (membership.team?.currentEventId) void socket.join(eventRoom(membership.team.currentEventId));
    // A later change of roles moves the socket (followRoles).
    if (can(membership.roles, 'incidents:read')) void socket.join(incidentsRoom(membership.teamId));
    next();
  });
  attachBroadcaster(io);
  return io;
}
