import { writeMark } from './mark-item';

/** Un-marks an item; the history keeps who took the mark back and when. */
export const clearItem = (teamId: string, userId: string, runId: string, itemId: string) =>
  writeMark(teamId, userId, runId, itemId, null, null);
