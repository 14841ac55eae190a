import type { Server } from 'socket.io';
import { can, type Role } from '../../shared/roles';

let io: Server | undefined;

/** Called once the Socket.IO server exists; before that (scripts, some tests) emits go nowhere. */
export function attachBroadcaster(server: Server | undefined) {
  io = server;
}

export const eventRoom = (eventId: string) => `event:${eventId}`;
export const teamRoom = (teamId: string) => `team:${teamId}`;
export const screenRoom = (screenId: string) => `screen:${screenId}`;
// A team's pit screens, apart from its tablets' team room: team-wide news reaches a screen only when asked.
export const teamScreensRoom = (teamId: string) => `screens:${teamId}`;
// The team's members who read the safety log: incident news never reaches the team room, the event room or a screen.
export const incidentsRoom = (teamId: string) => `incidents:${teamId}`;

/**
 * Tells every tablet on an event that something changed (`area:verb`, e.g. `field:progressed`).
 * Payloads are small (`{id}` and what changed): clients refetch what they show. Call it from
 * `transaction.afterCommit`, so a rolled-back write never reaches a tablet.
 */
export function emitToEvent(eventId: string, name: string, payload: object) {
  io?.to(eventRoom(eventId)).emit(name, payload);
}

/**
 * Same, for every tablet of a team (team-wide changes such as the current event). `withScreens`
 * also tells the team's pit screens: only for news a screen shows (the event), never people.
 */
export function emitToTeam(teamId: string, name: string, payload: object, { withScreens = false } = {}) {
  io?.to(withScreens ? [teamRoom(teamId), teamScreensRoom(teamId)] : teamRoom(teamId)).emit(name, payload);
}

/** Tells the tablets of the team's safety captains and mentors (incidents:read) that an incident changed: ids only. */
export function emitToIncidents(teamId: string, name: string, payload: object) {
  io?.to(incidentsRoom(teamId)).emit(name, payload);
}

/** The team's current event changed: its connected sockets follow it to the new event's room. */
export function moveTeamToEvent(teamId: string, fromEventId: string | null, toEventId: string) {
  if (!io) return;
  const rooms = [teamRoom(teamId), teamScreensRoom(teamId)];
  if (fromEventId) io.in(rooms).socketsLeave(eventRoom(fromEventId));
  io.in(rooms).socketsJoin(eventRoom(toEventId));
}

/** A pit screen was revoked: its open sockets are dropped now (the token no longer reconnects). */
export function disconnectScreen(screenId: string) {
  io?.in(screenRoom(screenId)).disconnectSockets(true);
}

export const sessionRoom = (sid: string) => `session:${sid}`;

/** Closes the sockets of ended sessions: they must hear nothing more of the team. */
export function disconnectSessions(sids: readonly string[]) {
  for (const sid of sids) io?.in(sessionRoom(sid)).disconnectSockets(true);
}

/**
 * A member's roles in a team changed: the live sockets of their sessions working there join or
 * leave the rooms those roles decide (the incidents room), without waiting for a reconnect.
 */
export function followRoles(sids: readonly string[], teamId: string, roles: readonly Role[]) {
  if (!io || sids.length === 0) return;
  const sockets = io.in(sids.map(sessionRoom));
  if (can(roles, 'incidents:read')) sockets.socketsJoin(incidentsRoom(teamId));
  else sockets.socketsLeave(incidentsRoom(teamId));
}
