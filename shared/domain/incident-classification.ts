/**
 * Incident classification (DESIGN §4.6): which class an incident falls in, from the treatment
 * given, by the complete list of first aid in OSHA 29 CFR 1904.7(b)(5)(ii) (REFERENCES §5), and
 * whether the safety contacts must hear of it at once. A classification for the team's own
 * records and alerts, not an official log: local rules, event staff and licensed medical advice
 * come first.
 */

export const INCIDENT_LOCATIONS = ['pit', 'queue', 'field', 'stands', 'travel', 'other'] as const;
export type IncidentLocation = (typeof INCIDENT_LOCATIONS)[number];

export const INCIDENT_KINDS = ['injury', 'near_miss', 'battery_or_chemical', 'tool_or_machine', 'property_damage', 'other'] as const;
export type IncidentKind = (typeof INCIDENT_KINDS)[number];

/** First aid, one code per item A–N of 1904.7(b)(5)(ii), in the rule's order. */
export const FIRST_AID_TREATMENTS = [
  'otc_medication',
  'tetanus_shot',
  'wound_cleaning',
  'wound_covering',
  'hot_cold_therapy',
  'non_rigid_support',
  'transport_immobilization',
  'nail_or_blister_drain',
  'eye_patch',
  'eye_flush_or_swab',
  'splinter_removal',
  'finger_guard',
  'massage',
  'fluids_for_heat',
] as const;

/** Treatment beyond that list (1904.7(b)(5)(iii): the list is complete, anything else is beyond it). */
export const BEYOND_FIRST_AID_TREATMENTS = [
  'sutures',
  'prescription_medication',
  'rigid_splint_or_cast',
  'physical_therapy',
  'eye_foreign_body_professional',
  'emergency_services',
  'hospital_visit',
] as const;

/** Not a treatment, but serious on its own (1904.7(a) names it beside medical treatment). */
export const LOSS_OF_CONSCIOUSNESS = 'loss_of_consciousness';

export const TREATMENT_CODES = [...FIRST_AID_TREATMENTS, ...BEYOND_FIRST_AID_TREATMENTS, LOSS_OF_CONSCIOUSNESS] as const;
export type TreatmentCode = (typeof TREATMENT_CODES)[number];

/** The treatments in plain words, as the report form and the exports show them. */
export const TREATMENT_LABELS: Record<TreatmentCode, string> = {
  otc_medication: 'Over-the-counter medicine at normal strength',
  tetanus_shot: 'Tetanus shot',
  wound_cleaning: 'Cleaning, flushing or soaking a surface wound',
  wound_covering: 'Bandage, plaster or butterfly strip',
  hot_cold_therapy: 'Ice pack or heat pack',
  non_rigid_support: 'Soft support: elastic bandage, wrap, sling without stays',
  transport_immobilization: 'Kept still only to move them (splint or collar for transport)',
  nail_or_blister_drain: 'Draining a blister or relieving pressure under a nail',
  eye_patch: 'Eye patch',
  eye_flush_or_swab: 'Something removed from the eye by flushing or a cotton swab',
  splinter_removal: 'Splinter removed (not from the eye) with tweezers or similar',
  finger_guard: 'Finger guard',
  massage: 'Massage',
  fluids_for_heat: 'Drinks to cool down from the heat',
  sutures: 'Stitches, staples or glue to close a wound',
  prescription_medication: 'Prescription medicine, or any medicine at prescription strength',
  rigid_splint_or_cast: 'Rigid splint, cast or brace with stays',
  physical_therapy: 'Physical therapy or chiropractic treatment',
  eye_foreign_body_professional: 'Something removed from the eye by a professional (not flushing or a swab)',
  emergency_services: 'Emergency services called',
  hospital_visit: 'Taken to a hospital or clinic for treatment',
  loss_of_consciousness: 'Lost consciousness, even briefly',
};

export type IncidentClass = 'near_miss' | 'first_aid_only' | 'beyond_first_aid';

export interface IncidentClassification {
  class: IncidentClass;
  /** The recorded treatments that decided the class: the beyond-first-aid ones when any, else the first aid. */
  basis: TreatmentCode[];
}

const isFirstAid = (code: TreatmentCode) => (FIRST_AID_TREATMENTS as readonly string[]).includes(code);

/**
 * The class of an incident. Treatment decides: anything beyond first aid (or a loss of
 * consciousness) is `beyond_first_aid`; first aid alone is `first_aid_only`; no treatment at
 * all is a `near_miss`. A report of kind "near miss" with a treatment recorded is classed by its
 * treatment: someone was hurt, and the class must never be lower than the care given.
 */
export function classifyIncident({ treatments }: { kind: IncidentKind; treatments: readonly TreatmentCode[] }): IncidentClassification {
  const given = TREATMENT_CODES.filter((code) => treatments.includes(code));
  const beyond = given.filter((code) => !isFirstAid(code));
  if (beyond.length > 0) return { class: 'beyond_first_aid', basis: beyond };
  if (given.length > 0) return { class: 'first_aid_only', basis: given };
  return { class: 'near_miss', basis: [] };
}

export type AlertReason = 'beyond_first_aid' | 'loss_of_consciousness' | 'battery_or_chemical';

/**
 * Whether the safety contacts are alerted at once, and why: care beyond first aid, a loss of
 * consciousness, or any battery acid or chemical exposure (even one that needed no care yet).
 */
export function immediateAlertReasons({ kind, treatments }: { kind: IncidentKind; treatments: readonly TreatmentCode[] }): AlertReason[] {
  const reasons: AlertReason[] = [];
  if (treatments.some((code) => code !== LOSS_OF_CONSCIOUSNESS && !isFirstAid(code))) reasons.push('beyond_first_aid');
  if (treatments.includes(LOSS_OF_CONSCIOUSNESS)) reasons.push('loss_of_consciousness');
  if (kind === 'battery_or_chemical') reasons.push('battery_or_chemical');
  return reasons;
}
