import { z } from 'zod';
import type { ReadinessJson } from '../domain/readiness';
import type { TimelineJson } from '../domain/timeline';
import { clientId } from './common';
import type { MatchJson } from './schedule';

export const SCREEN_NAME_MAX = 60;

export const createScreenSchema = z
  .object({
    id: clientId.optional(),
    name: z
      .string({ message: 'Give a name, e.g. Pit TV' })
      .trim()
      .min(1, { message: 'Give a name, e.g. Pit TV' })
      .max(SCREEN_NAME_MAX, { message: `At most ${SCREEN_NAME_MAX} characters` }),
  })
  .strict();
export type CreateScreenInput = z.infer<typeof createScreenSchema>;

/** A pit screen as admins see it; the token itself is never listed. */
export interface ScreenJson {
  id: string;
  name: string;
  createdAt: string;
  revokedAt: string | null;
}

/**
 * Answer to adding a screen: the token and its path are shown this once (the server keeps only
 * a hash). A resent create answers without them.
 */
export interface CreatedScreenJson extends ScreenJson {
  token?: string;
  path?: string;
}

/** The event as a pit screen sees it: no settings, nothing about people. */
export interface ScreenEventJson {
  id: string;
  name: string;
  venue: string;
  timeZone: string;
  startDate: string;
  endDate: string;
  teamNumber: number;
}

/** GET /api/screen/:token: the team's current event and its schedule, read without a session. */
export interface ScreenBoardJson {
  team: { number: number; name: string };
  event: ScreenEventJson | null;
  timeline: TimelineJson | null;
  matches: MatchJson[] | null;
  /** Of our next match; null without an event or a match of ours still to play. */
  readiness: ReadinessJson | null;
}
