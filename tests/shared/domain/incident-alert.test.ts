import { describe, expect, it } from 'vitest';
import { alertRuleFor, composeIncidentAlert, isEscalation, type IncidentAlertInput } from '../../../shared/domain/incident-alert';

const base: IncidentAlertInput = {
  teamName: 'Example Team',
  kind: 'injury',
  location: 'pit',
  occurredAt: new Date('2027-03-06T15:20:00Z'),
  timeZone: 'America/Chicago',
  treatments: [],
  involvedCount: 1,
  link: 'http://localhost:5180/safety/incidents/00000000-0000-4000-8000-000000000001',
};

describe('alertRuleFor', () => {
  it('puts anything with a reason to tell at once under the immediate rule', () => {
    expect(alertRuleFor({ kind: 'injury', treatments: ['sutures'] })).toBe('immediate');
    expect(alertRuleFor({ kind: 'injury', treatments: ['loss_of_consciousness'] })).toBe('immediate');
    // Acid exposure needs no treatment to be told at once (DESIGN §4.6).
    expect(alertRuleFor({ kind: 'battery_or_chemical', treatments: [] })).toBe('immediate');
    expect(alertRuleFor({ kind: 'battery_or_chemical', treatments: ['eye_flush_or_swab'] })).toBe('immediate');
  });

  it('puts the rest under their class', () => {
    expect(alertRuleFor({ kind: 'injury', treatments: ['wound_covering'] })).toBe('first_aid_only');
    expect(alertRuleFor({ kind: 'tool_or_machine', treatments: [] })).toBe('near_miss');
    expect(alertRuleFor({ kind: 'near_miss', treatments: [] })).toBe('near_miss');
  });
});

describe('isEscalation', () => {
  it('is true the first time and when the rule gets more serious, never when it gets less', () => {
    expect(isEscalation(null, 'near_miss')).toBe(true);
    expect(isEscalation('near_miss', 'first_aid_only')).toBe(true);
    expect(isEscalation('first_aid_only', 'immediate')).toBe(true);
    expect(isEscalation('immediate', 'first_aid_only')).toBe(false);
    expect(isEscalation('first_aid_only', 'first_aid_only')).toBe(false);
  });
});

describe('composeIncidentAlert', () => {
  it('says in the subject how serious it is, what and where', () => {
    const alert = composeIncidentAlert({ ...base, treatments: ['hospital_visit'] });
    expect(alert.subject).toBe('Safety alert, Example Team: beyond first aid, injury in the pit');
    expect(alert.text).toContain('Sent at once because of: care beyond first aid.');
    expect(alert.text).toContain('Care given: Taken to a hospital or clinic for treatment.');
  });

  it('logs a first-aid-only incident without calling it an alert', () => {
    const alert = composeIncidentAlert({ ...base, treatments: ['wound_covering', 'hot_cold_therapy'] });
    expect(alert.subject).toBe('Incident logged, Example Team: first aid only, injury in the pit');
    expect(alert.text).not.toContain('Sent at once');
  });

  it('gives the time in the event zone and the link', () => {
    // 15:20 UTC on 6 March 2027 is 09:20 in Chicago (CST, UTC-6, before the DST change on 14 March).
    const alert = composeIncidentAlert(base);
    expect(alert.text).toContain('Sat 6 Mar 2027 at 09:20 (America/Chicago)');
    expect(alert.text).toContain(base.link);
  });

  it('is a few lines, says the classification is the team’s own, and defers to medical advice', () => {
    const alert = composeIncidentAlert({ ...base, kind: 'battery_or_chemical', treatments: ['eye_flush_or_swab'] });
    expect(alert.text.split('\n').length).toBeLessThanOrEqual(10);
    expect(alert.text).toContain('not an official log');
    expect(alert.text).toContain('licensed medical advice come first');
    expect(alert.subject).toBe('Safety alert, Example Team: first aid only, battery acid or chemical in the pit');
  });
});
