import { useEffect, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { io } from 'socket.io-client';
import { CheckIcon, OfflineIcon } from '../components/ui/icons';
import { StatusTag } from '../components/ui/status-tag';

export type LiveStatus = 'live' | 'reconnecting' | 'offline';

// Server events (`area:verb`) → the query keys they make stale. Events carry ids only; the
// queries refetch what each screen shows.
// Readiness reads the checks and the schedule (alliance, queue time): changes to either make it stale.
// The battery plan reads the schedule's queue times too, and readiness reads the installed battery.
const CHECK_RUNS = [['checklist-runs'], ['checklist-run'], ['readiness']];
const BATTERIES = [['batteries'], ['battery'], ['chargers'], ['battery-settings'], ['battery-plan'], ['readiness']];
// Repairs: a ticket's list, its page and readiness (a blocking ticket holds the robot back). The
// repair list also carries the next queue call its minutes left count to, which moves with the
// schedule: schedule changes make it stale as well.
const REPAIRS = [['repairs'], ['repair'], ['readiness']];
const SCHEDULE = [['matches'], ['timeline'], ['readiness'], ['battery-plan'], ['repairs']];
const STALE_AFTER: Record<string, string[][]> = {
  'events:updated': [['events'], ['team'], ['readiness'], ['battery-plan'], ['repairs']],
  'matches:imported': SCHEDULE,
  'matches:updated': SCHEDULE,
  'field:progressed': SCHEDULE,
  'checks:templates-changed': [['checklist-templates'], ['checklist-template']],
  'checks:run-started': CHECK_RUNS,
  'checks:marked': CHECK_RUNS,
  'checks:signed-off': CHECK_RUNS,
  'batteries:changed': BATTERIES,
  'batteries:used': BATTERIES,
  'repairs:created': REPAIRS,
  'repairs:changed': REPAIRS,
  'repairs:subsystems-changed': [['repair-subsystems']],
  // Only safety and admin sockets hear it (the server's incidents room): the log and the open report.
  'incidents:changed': [['incidents'], ['incident']],
};

/**
 * One Socket.IO connection for the signed-in shell (the session cookie signs it in). After a
 * reconnect everything on screen is refetched: the socket cannot say what was missed.
 */
export function useLiveUpdates(teamId: string): LiveStatus {
  const queryClient = useQueryClient();
  const [status, setStatus] = useState<LiveStatus>('reconnecting');
  useEffect(() => {
    if (!teamId) return;
    const socket = io({ withCredentials: true });
    let connectedBefore = false;
    socket.on('connect', () => {
      if (connectedBefore) void queryClient.invalidateQueries();
      connectedBefore = true;
      setStatus('live');
    });
    socket.on('disconnect', () => setStatus(navigator.onLine ? 'reconnecting' : 'offline'));
    socket.on('connect_error', () => setStatus(navigator.onLine ? 'reconnecting' : 'offline'));
    for (const [name, keys] of Object.entries(STALE_AFTER)) {
      socket.on(name, () => keys.forEach((queryKey) => void queryClient.invalidateQueries({ queryKey })));
    }
    return () => {
      socket.disconnect();
    };
  }, [teamId, queryClient]);
  return status;
}

/** Whether what the screen shows is live: icon + word + colour. */
export function LiveStatusTag({ status }: { status: LiveStatus }) {
  if (status === 'live') return <StatusTag tone="ok" icon={<CheckIcon className="size-4" />}>Live</StatusTag>;
  if (status === 'offline') return <StatusTag tone="danger" icon={<OfflineIcon className="size-4" />}>Offline</StatusTag>;
  return (
    <StatusTag tone="warning" icon={<OfflineIcon className="size-4" />}>
      Reconnecting…
    </StatusTag>
  );
}
