/**
 * What the Repairs area takes from other areas, which it must not import: the app's routes fill
 * these from the schedule feature (matches) and the team feature (members).
 */

/** A match of the event, as a ticket names the match it was found in. */
export interface RepairMatch {
  id: string;
  /** "Qualification 12". */
  name: string;
  /** "Q12", for a card's narrow line. */
  short: string;
  ours: boolean;
  /** On the field already. */
  started: boolean;
}

/** A member a ticket may be assigned to (someone who works on repairs); `id` is the user id tickets carry. */
export interface RepairAssignee {
  id: string;
  name: string;
}

/** The match's short name for a ticket's `foundInMatchId`, or null. */
export function matchLabelOf(matches: readonly RepairMatch[], matchId: string | null): RepairMatch | null {
  return matchId === null ? null : (matches.find((match) => match.id === matchId) ?? null);
}
