import { TZDate } from '@date-fns/tz';
import { format } from 'date-fns';
import type { AlertRuleKey } from '../schemas/mail';
import {
  classifyIncident,
  immediateAlertReasons,
  TREATMENT_LABELS,
  type AlertReason,
  type IncidentClass,
  type IncidentKind,
  type IncidentLocation,
  type TreatmentCode,
} from './incident-classification';

/** Which alert rule an incident falls under: `immediate` whenever there is a reason to tell at once. */
export function alertRuleFor({ kind, treatments }: { kind: IncidentKind; treatments: readonly TreatmentCode[] }): AlertRuleKey {
  const incidentClass = classifyIncident({ kind, treatments }).class;
  // Beyond first aid is always a reason to tell at once; the test keeps the type honest too.
  if (incidentClass === 'beyond_first_aid' || immediateAlertReasons({ kind, treatments }).length > 0) return 'immediate';
  return incidentClass;
}

const RULE_SEVERITY: Record<AlertRuleKey, number> = { near_miss: 0, first_aid_only: 1, immediate: 2 };

/** True when an edit moved an incident to a more serious rule than the one already alerted (a later hospital visit). */
export function isEscalation(alerted: AlertRuleKey | null, now: AlertRuleKey): boolean {
  return alerted === null || RULE_SEVERITY[now] > RULE_SEVERITY[alerted];
}

const CLASS_WORDS: Record<IncidentClass, string> = {
  near_miss: 'near miss',
  first_aid_only: 'first aid only',
  beyond_first_aid: 'beyond first aid',
};
const KIND_WORDS: Record<IncidentKind, string> = {
  injury: 'injury',
  near_miss: 'near miss',
  battery_or_chemical: 'battery acid or chemical',
  tool_or_machine: 'tool or machine',
  property_damage: 'property damage',
  other: 'incident',
};
const LOCATION_WORDS: Record<IncidentLocation, string> = {
  pit: 'in the pit',
  queue: 'in the queue',
  field: 'on the field',
  stands: 'in the stands',
  travel: 'while travelling',
  other: 'elsewhere',
};
const REASON_WORDS: Record<AlertReason, string> = {
  beyond_first_aid: 'care beyond first aid',
  loss_of_consciousness: 'loss of consciousness',
  battery_or_chemical: 'battery acid or chemical exposure',
};

export interface IncidentAlertInput {
  teamName: string;
  kind: IncidentKind;
  location: IncidentLocation;
  occurredAt: Date;
  timeZone: string;
  treatments: readonly TreatmentCode[];
  involvedCount: number;
  link: string;
}

/**
 * The alert e-mail for an incident: a subject that says how serious, and a few lines that say
 * what, where, when and what care was given, with the link to the report. Never the
 * description or initials: the alert may go to addresses outside the team, and people
 * involved are not named in mail.
 */
export function composeIncidentAlert(input: IncidentAlertInput): { subject: string; text: string } {
  const { class: incidentClass } = classifyIncident(input);
  const reasons = immediateAlertReasons(input);
  const what = `${KIND_WORDS[input.kind]} ${LOCATION_WORDS[input.location]}`;
  const subject =
    reasons.length > 0
      ? `Safety alert, ${input.teamName}: ${CLASS_WORDS[incidentClass]}, ${what}`
      : `Incident logged, ${input.teamName}: ${CLASS_WORDS[incidentClass]}, ${what}`;
  const when = format(new TZDate(input.occurredAt, input.timeZone), "EEE d MMM yyyy 'at' HH:mm");
  const care = input.treatments.length > 0 ? input.treatments.map((code) => TREATMENT_LABELS[code]).join('; ') : 'none recorded';
  const lines = [
    `${capitalise(what)}, ${when} (${input.timeZone}).`,
    `Classified as ${CLASS_WORDS[incidentClass]} (the team's own classification, not an official log).`,
    ...(reasons.length > 0 ? [`Sent at once because of: ${reasons.map((reason) => REASON_WORDS[reason]).join(', ')}.`] : []),
    `Care given: ${care}.`,
    `People involved: ${input.involvedCount}.`,
    '',
    `The report (safety captains and mentors only): ${input.link}`,
    '',
    'Local rules, event staff and licensed medical advice come first.',
  ];
  return { subject, text: lines.join('\n') };
}

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);
