import { describe, expect, it } from 'vitest';
import {
  BEYOND_FIRST_AID_TREATMENTS,
  classifyIncident,
  FIRST_AID_TREATMENTS,
  immediateAlertReasons,
  TREATMENT_CODES,
  TREATMENT_LABELS,
  type TreatmentCode,
} from '../../../shared/domain/incident-classification';

// Source: OSHA 29 CFR 1904.7(b)(5)(ii), items A–N, the complete list of first aid (REFERENCES §5,
// published); 1904.7(b)(5)(iii): any treatment not on the list is beyond first aid.
const OSHA_FIRST_AID: [letter: string, item: string, code: TreatmentCode][] = [
  ['A', 'non-prescription medication at non-prescription strength', 'otc_medication'],
  ['B', 'tetanus immunization', 'tetanus_shot'],
  ['C', 'cleaning, flushing or soaking surface wounds', 'wound_cleaning'],
  ['D', 'wound coverings, butterfly bandages, Steri-Strips', 'wound_covering'],
  ['E', 'hot or cold therapy', 'hot_cold_therapy'],
  ['F', 'non-rigid means of support', 'non_rigid_support'],
  ['G', 'temporary immobilization for transport', 'transport_immobilization'],
  ['H', 'drilling a nail or draining a blister', 'nail_or_blister_drain'],
  ['I', 'eye patches', 'eye_patch'],
  ['J', 'removing foreign bodies from the eye by irrigation or cotton swab', 'eye_flush_or_swab'],
  ['K', 'removing splinters from areas other than the eye by simple means', 'splinter_removal'],
  ['L', 'finger guards', 'finger_guard'],
  ['M', 'massages', 'massage'],
  ['N', 'drinking fluids for heat stress', 'fluids_for_heat'],
];

// Examples the rule itself names as beyond first aid (REFERENCES §5: sutures and staples beyond D,
// rigid stays beyond F); the others are medical treatment by 1904.7(b)(5)(iii) as they are not on
// the list. Emergency services and a hospital visit stand for care given there (the team's rule).
const BEYOND: TreatmentCode[] = ['sutures', 'prescription_medication', 'rigid_splint_or_cast', 'physical_therapy', 'eye_foreign_body_professional', 'emergency_services', 'hospital_visit'];

describe('classifyIncident against the OSHA first-aid list', () => {
  it('has one first-aid code per item A–N, in the rule’s order, and nothing else counts as first aid', () => {
    expect(FIRST_AID_TREATMENTS).toEqual(OSHA_FIRST_AID.map(([, , code]) => code));
    expect(BEYOND_FIRST_AID_TREATMENTS).toEqual(BEYOND);
  });

  for (const [letter, item, code] of OSHA_FIRST_AID) {
    it(`1904.7(b)(5)(ii)(${letter}) ${item} alone → first aid only`, () => {
      expect(classifyIncident({ kind: 'injury', treatments: [code] })).toEqual({ class: 'first_aid_only', basis: [code] });
    });
  }

  for (const code of BEYOND) {
    it(`${code} alone → beyond first aid`, () => {
      expect(classifyIncident({ kind: 'injury', treatments: [code] })).toEqual({ class: 'beyond_first_aid', basis: [code] });
    });
  }

  it('a loss of consciousness alone is beyond first aid (1904.7(a) names it beside medical treatment)', () => {
    expect(classifyIncident({ kind: 'injury', treatments: ['loss_of_consciousness'] })).toEqual({ class: 'beyond_first_aid', basis: ['loss_of_consciousness'] });
  });
});

describe('classifyIncident: mixes and no treatment', () => {
  it('several first-aid items stay first aid only, the basis listing each once in the list’s order', () => {
    const result = classifyIncident({ kind: 'injury', treatments: ['hot_cold_therapy', 'wound_cleaning', 'wound_covering', 'wound_cleaning'] });
    expect(result).toEqual({ class: 'first_aid_only', basis: ['wound_cleaning', 'wound_covering', 'hot_cold_therapy'] });
  });

  it('one treatment beyond first aid among first aid makes it beyond, with only that one as the basis', () => {
    const result = classifyIncident({ kind: 'tool_or_machine', treatments: ['wound_cleaning', 'sutures', 'otc_medication'] });
    expect(result).toEqual({ class: 'beyond_first_aid', basis: ['sutures'] });
  });

  it('D covers butterfly strips but not stitches: the two together are beyond first aid', () => {
    expect(classifyIncident({ kind: 'injury', treatments: ['wound_covering', 'sutures'] }).class).toBe('beyond_first_aid');
  });

  it('no treatment is a near miss, whatever the kind', () => {
    expect(classifyIncident({ kind: 'near_miss', treatments: [] })).toEqual({ class: 'near_miss', basis: [] });
    expect(classifyIncident({ kind: 'property_damage', treatments: [] })).toEqual({ class: 'near_miss', basis: [] });
    expect(classifyIncident({ kind: 'injury', treatments: [] })).toEqual({ class: 'near_miss', basis: [] });
  });

  it('a report of kind near miss with a treatment is classed by the treatment, never lower than the care given', () => {
    expect(classifyIncident({ kind: 'near_miss', treatments: ['eye_flush_or_swab'] })).toEqual({ class: 'first_aid_only', basis: ['eye_flush_or_swab'] });
    expect(classifyIncident({ kind: 'near_miss', treatments: ['hospital_visit'] }).class).toBe('beyond_first_aid');
  });
});

describe('immediateAlertReasons', () => {
  it('alerts at once for care beyond first aid', () => {
    expect(immediateAlertReasons({ kind: 'injury', treatments: ['wound_cleaning', 'sutures'] })).toEqual(['beyond_first_aid']);
  });

  it('alerts at once for a loss of consciousness, named as such', () => {
    expect(immediateAlertReasons({ kind: 'injury', treatments: ['loss_of_consciousness', 'fluids_for_heat'] })).toEqual(['loss_of_consciousness']);
  });

  it('alerts at once for any battery acid or chemical exposure, even with no care needed yet (DESIGN §4.6)', () => {
    expect(immediateAlertReasons({ kind: 'battery_or_chemical', treatments: [] })).toEqual(['battery_or_chemical']);
    expect(immediateAlertReasons({ kind: 'battery_or_chemical', treatments: ['eye_flush_or_swab', 'emergency_services'] })).toEqual(['beyond_first_aid', 'battery_or_chemical']);
  });

  it('does not alert at once for first aid only or a near miss of another kind', () => {
    for (const [, , code] of OSHA_FIRST_AID) expect(immediateAlertReasons({ kind: 'injury', treatments: [code] })).toEqual([]);
    expect(immediateAlertReasons({ kind: 'near_miss', treatments: [] })).toEqual([]);
  });
});

it('names every treatment in plain words, without the code', () => {
  for (const code of TREATMENT_CODES) {
    expect(TREATMENT_LABELS[code].length).toBeGreaterThan(4);
    expect(TREATMENT_LABELS[code]).not.toContain('_');
  }
});
