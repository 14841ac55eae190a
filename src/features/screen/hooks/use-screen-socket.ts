import { useEffect, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { io } from 'socket.io-client';
import { screenBoardQueryOptions } from '../api/get-screen-board';

export type ScreenLiveStatus = 'live' | 'reconnecting';

// Everything a screen shows lives in its one answer (readiness included): any of these makes it stale.
const REFETCH_ON = [
  'field:progressed',
  'matches:imported',
  'matches:updated',
  'events:updated',
  'checks:run-started',
  'checks:marked',
  'checks:signed-off',
  // A battery in or out of the robot changes the next match's readiness (ids only; no names).
  'batteries:used',
  // A reading or a retirement can change whether the installed battery is charged enough.
  'batteries:changed',
];

/**
 * The pit screen's own Socket.IO connection, signed in by its token (a TV has no session). After
 * a reconnect, or a refusal (a revoked token), the board is refetched: the socket cannot say what
 * was missed, and a revoked token then shows as such.
 */
export function useScreenSocket(token: string): ScreenLiveStatus {
  const queryClient = useQueryClient();
  const [status, setStatus] = useState<ScreenLiveStatus>('reconnecting');
  useEffect(() => {
    const { queryKey } = screenBoardQueryOptions(token);
    const refetch = () => void queryClient.invalidateQueries({ queryKey });
    // withCredentials off: a screen never rides on whoever may be signed in on this browser.
    const socket = io({ auth: { screenToken: token }, withCredentials: false });
    let connectedBefore = false;
    let retry: ReturnType<typeof setTimeout> | undefined;
    socket.on('connect', () => {
      if (connectedBefore) refetch();
      connectedBefore = true;
      setStatus('live');
    });
    socket.on('disconnect', (reason) => {
      setStatus('reconnecting');
      // The server dropped us (revoked): Socket.IO does not retry that by itself.
      if (reason === 'io server disconnect') {
        refetch();
        retry = setTimeout(() => socket.connect(), 5_000);
      }
    });
    socket.on('connect_error', () => {
      setStatus('reconnecting');
      refetch();
    });
    for (const name of REFETCH_ON) socket.on(name, refetch);
    return () => {
      clearTimeout(retry);
      socket.disconnect();
    };
  }, [token, queryClient]);
  return status;
}
