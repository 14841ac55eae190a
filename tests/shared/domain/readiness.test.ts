import { describe, expect, it } from 'vitest';
import {
  computeReadiness,
  QUEUE_NEAR_MS,
  READINESS_RULES,
  type ReadinessFacts,
  type ReadinessItem,
  type ReadinessRun,
} from '../../../shared/domain/readiness';

// Worked cases of DESIGN §4.4 as this project decided it (DEVELOPERS.md, "Readiness"): a fault is
// not ready at once; work still open is at risk until the queue call and not ready after it.
const NOW = new Date('2027-03-06T15:00:00.000Z');
const minutesFromNow = (minutes: number) => new Date(NOW.getTime() + minutes * 60_000).toISOString();

function item(label: string, overrides: Partial<ReadinessItem> = {}): ReadinessItem {
  return { label, required: true, done: false, failed: false, value: null, purpose: null, min: null, max: null, unit: null, markedAt: null, ...overrides };
}
const ticked = (label: string, overrides: Partial<ReadinessItem> = {}) => item(label, { done: true, value: true, ...overrides });
const bumpers = (value: string | null) => item('Bumper colour', { purpose: 'bumper_colour', value, done: value !== null });

function run(items: ReadinessItem[], signOff: ReadinessRun['signOff'] = null): ReadinessRun {
  return { name: 'Before the match', items, signOff };
}

function facts(overrides: Partial<ReadinessFacts> = {}, queueInMinutes: number | null = 30): ReadinessFacts {
  return {
    match: { id: 'm14', alliance: 'red', queueAt: queueInMinutes === null ? null : minutesFromNow(queueInMinutes) },
    preMatchRuns: [run([ticked('Main breaker on'), ticked('Battery strapped'), bumpers('Red')])],
    ...overrides,
  };
}

const codes = (result: ReturnType<typeof computeReadiness>) => result.reasons.map((reason) => reason.code);

describe('computeReadiness: states', () => {
  it('is ready with no reasons when every item is done and the bumpers match', () => {
    expect(computeReadiness(facts(), NOW)).toEqual({ matchId: 'm14', state: 'ready', reasons: [] });
  });

  it('is at risk while required items are open and the queue call is still far off', () => {
    const result = computeReadiness(facts({ preMatchRuns: [run([ticked('Main breaker on'), item('Radio secured'), bumpers('Red')])] }), NOW);
    expect(result.state).toBe('at_risk');
    expect(result.reasons).toEqual([
      { code: 'checklist_incomplete', level: 'at_risk', message: 'Before the match: 1 required item open (Radio secured)' },
    ]);
  });

  it('adds the near queue call, still at risk, when required items remain under five minutes before it', () => {
    const result = computeReadiness(facts({ preMatchRuns: [run([item('Radio secured'), bumpers('Red')])] }, 3), NOW);
    expect(result.state).toBe('at_risk');
    expect(codes(result)).toEqual(['checklist_incomplete', 'queue_call_near']);
    expect(result.reasons[1].message).toBe('Queue call in 3 min and required work is still open');
  });

  it('stays quiet about the queue call when nothing required is open', () => {
    expect(computeReadiness(facts({}, 2), NOW).state).toBe('ready');
  });

  it('becomes not ready once the queue call has passed with required items open', () => {
    const result = computeReadiness(facts({ preMatchRuns: [run([item('Radio secured'), bumpers('Red')])] }, -4), NOW);
    expect(result.state).toBe('not_ready');
    expect(result.reasons.map((reason) => [reason.code, reason.level])).toEqual([
      ['checklist_incomplete', 'not_ready'],
      ['queue_call_passed', 'not_ready'],
    ]);
    expect(result.reasons[1].message).toBe('The queue call was 4 min ago and required work is still open');
  });

  it('is at risk when only optional items are open, whatever the clock says', () => {
    const preMatchRuns = [run([ticked('Main breaker on'), item('Spare zip ties in the cart', { required: false }), bumpers('Red')])];
    for (const queueIn of [30, 2, -10]) {
      const result = computeReadiness(facts({ preMatchRuns }, queueIn), NOW);
      expect(result.state).toBe('at_risk');
      expect(codes(result)).toEqual(['advisory_open']);
    }
  });

  it('at exactly five minutes before the queue call the work is not yet "near"', () => {
    const preMatchRuns = [run([item('Radio secured'), bumpers('Red')])];
    const exactly = { ...facts({ preMatchRuns }), match: { id: 'm14', alliance: 'red' as const, queueAt: new Date(NOW.getTime() + QUEUE_NEAR_MS).toISOString() } };
    expect(codes(computeReadiness(exactly, NOW))).toEqual(['checklist_incomplete']);
  });

  it('without a queue time (a match already on the field) open work stays at risk', () => {
    const result = computeReadiness(facts({ preMatchRuns: [run([item('Radio secured'), bumpers('Red')])] }, null), NOW);
    expect(result.state).toBe('at_risk');
    expect(codes(result)).toEqual(['checklist_incomplete']);
  });
});

describe('computeReadiness: every reason', () => {
  it('no pre-match run started', () => {
    const result = computeReadiness(facts({ preMatchRuns: [] }), NOW);
    expect(result.reasons).toEqual([{ code: 'checklist_missing', level: 'at_risk', message: 'No pre-match check has been started for this match' }]);
  });

  it('names three open items and counts the rest', () => {
    const open = ['Radio secured', 'Main breaker on', 'No loose fasteners', 'Code version confirmed', 'Camera aimed'].map((label) => item(label));
    const [reason] = computeReadiness(facts({ preMatchRuns: [run([...open, bumpers('Red')])] }), NOW).reasons;
    expect(reason.message).toBe('Before the match: 5 required items open (Radio secured, Main breaker on, No loose fasteners and 2 more)');
  });

  it('a number out of limits is not ready at once, with its value and limits', () => {
    const pressure = item('Stored air pressure', { value: 131, failed: true, min: 60, max: 120, unit: 'psi' });
    const result = computeReadiness(facts({ preMatchRuns: [run([ticked('Main breaker on'), pressure, bumpers('Red')])] }, 40), NOW);
    expect(result.state).toBe('not_ready');
    expect(result.reasons).toEqual([
      { code: 'out_of_limits', level: 'not_ready', message: 'Stored air pressure: 131 psi is outside the limits (60 – 120 psi)' },
    ]);
  });

  it('bumper colour not confirmed says which alliance we are on', () => {
    const result = computeReadiness(facts({ preMatchRuns: [run([ticked('Main breaker on'), bumpers(null)])] }), NOW);
    expect(result.reasons).toEqual([
      { code: 'bumper_unconfirmed', level: 'at_risk', message: 'Bumper colour not confirmed yet: we are on the RED alliance' },
    ]);
  });

  it('bumpers of the other colour are not ready, even far from the queue call', () => {
    const result = computeReadiness(facts({ preMatchRuns: [run([ticked('Main breaker on'), bumpers('Blue')])] }, 60), NOW);
    expect(result.state).toBe('not_ready');
    expect(result.reasons).toEqual([
      { code: 'bumper_mismatch', level: 'not_ready', message: 'Blue bumpers are marked, but we are on the RED alliance: change the bumpers' },
    ]);
  });

  it('the bumper rule follows the alliance of the match (blue)', () => {
    const blueMatch = { ...facts({ preMatchRuns: [run([bumpers('Blue')])] }), match: { id: 'm15', alliance: 'blue' as const, queueAt: minutesFromNow(30) } };
    expect(computeReadiness(blueMatch, NOW).state).toBe('ready');
  });

  it('a lead sign-off with items open or out of limits turns them into one at-risk reason with the written reason', () => {
    const pressure = item('Stored air pressure', { value: 121, failed: true, min: 60, max: 120, unit: 'psi', markedAt: minutesFromNow(-15) });
    const signedOff = run([pressure, item('Radio secured'), bumpers('Red')], { at: minutesFromNow(-10), reason: 'Gauge reads high; checked with a second gauge' });
    const result = computeReadiness(facts({ preMatchRuns: [signedOff] }, -2), NOW);
    expect(result.state).toBe('at_risk');
    expect(result.reasons).toEqual([
      {
        code: 'signed_off_incomplete',
        level: 'at_risk',
        message: 'Before the match was signed off by a lead with 2 items not done (Stored air pressure, Radio secured): “Gauge reads high; checked with a second gauge”',
      },
    ]);
  });

  it('a sign-off does not excuse bumpers of the wrong colour', () => {
    const signedOff = run([item('Radio secured'), bumpers('Blue')], { at: minutesFromNow(-10), reason: 'Radio checked by the field staff' });
    expect(codes(computeReadiness(facts({ preMatchRuns: [signedOff] }), NOW))).toEqual(['bumper_mismatch', 'signed_off_incomplete']);
  });

  it('a sign-off without a reason (the run was complete then) excuses nothing found open or out of limits since', () => {
    const lowAgain = item('Stored air pressure', { value: 80, failed: true, min: 100, max: 120, unit: 'psi', markedAt: minutesFromNow(-2) });
    const signedOff = run([lowAgain, item('Radio secured'), bumpers('Red')], { at: minutesFromNow(-10), reason: null });
    const result = computeReadiness(facts({ preMatchRuns: [signedOff] }, -1), NOW);
    expect(result.state).toBe('not_ready');
    expect(codes(result)).toEqual(['out_of_limits', 'checklist_incomplete', 'queue_call_passed']);
  });

  it('a number marked out of limits after a sign-off with a reason is not excused by it', () => {
    const lowAgain = item('Stored air pressure', { value: 80, failed: true, min: 100, max: 120, unit: 'psi', markedAt: minutesFromNow(-2) });
    const signedOff = run([lowAgain, item('Radio secured'), bumpers('Red')], { at: minutesFromNow(-10), reason: 'Radio checked by the field staff' });
    const result = computeReadiness(facts({ preMatchRuns: [signedOff] }), NOW);
    expect(result.state).toBe('not_ready');
    expect(result.reasons).toEqual([
      { code: 'out_of_limits', level: 'not_ready', message: 'Stored air pressure: 80 psi is outside the limits (100 – 120 psi)' },
      {
        code: 'signed_off_incomplete',
        level: 'at_risk',
        message: 'Before the match was signed off by a lead with 1 item not done (Radio secured): “Radio checked by the field staff”',
      },
    ]);
  });

  it('no battery installed, once batteries are tracked: at risk, then not ready at the queue call', () => {
    const noBattery = { battery: { installed: null, minimumChargePercent: 90 } };
    expect(computeReadiness(facts(noBattery), NOW).reasons).toEqual([
      { code: 'battery_not_installed', level: 'at_risk', message: 'No battery is recorded as installed for this match' },
    ]);
    expect(computeReadiness(facts(noBattery, -1), NOW).state).toBe('not_ready');
  });

  it('a battery below the minimum start charge is not ready', () => {
    const low = { battery: { installed: { label: 'C', stateOfChargePercent: 82.4 }, minimumChargePercent: 90 } };
    expect(computeReadiness(facts(low), NOW).reasons).toEqual([
      { code: 'battery_low', level: 'not_ready', message: 'Battery C is at about 82 %, below the 90 % a match needs' },
    ]);
  });

  it('a charged battery adds nothing', () => {
    expect(computeReadiness(facts({ battery: { installed: { label: 'A', stateOfChargePercent: 97 }, minimumChargePercent: 90 } }), NOW).state).toBe('ready');
  });

  it('a battery whose charge is unknown (never read nor charged) is at risk, whatever the clock', () => {
    const unknown = { battery: { installed: { label: 'A', stateOfChargePercent: null }, minimumChargePercent: 90 } };
    const reasons = [{ code: 'battery_charge_unknown', level: 'at_risk', message: 'Battery A has no reading yet: check its charge before the match' }];
    expect(computeReadiness(facts(unknown), NOW).reasons).toEqual(reasons);
    expect(computeReadiness(facts(unknown, -5), NOW).reasons).toEqual(reasons);
  });

  it('an open repair that blocks the match is at risk before the queue call and not ready once it has passed, named', () => {
    const open = { blockingRepairs: [{ id: 'r1', title: 'Intake roller shaft snapped', late: false }] };
    const message = 'Open repair blocks this match: Intake roller shaft snapped';
    expect(computeReadiness(facts(open), NOW).reasons).toEqual([{ code: 'repair_blocks_match', level: 'at_risk', message }]);
    const passed = computeReadiness(facts(open, -1), NOW);
    expect(passed.state).toBe('not_ready');
    expect(passed.reasons).toContainEqual({ code: 'repair_blocks_match', level: 'not_ready', message });
  });

  it('a blocking repair that cannot make the queue call is not ready at once', () => {
    const late = { blockingRepairs: [{ id: 'r1', title: 'Arm gearbox stripped', late: true }] };
    expect(computeReadiness(facts(late), NOW).reasons).toEqual([
      { code: 'repair_blocks_match', level: 'not_ready', message: 'Open repair blocks this match and cannot make the queue call: Arm gearbox stripped' },
    ]);
  });

  it('facts an area does not track yet add no reason', () => {
    const result = computeReadiness(facts({ battery: undefined, blockingRepairs: undefined }), NOW);
    expect(result.state).toBe('ready');
  });
});

describe('computeReadiness: order and rules', () => {
  it('lists not-ready reasons before at-risk ones, each level in rule order', () => {
    const preMatchRuns = [run([item('Radio secured'), item('Spare zip ties', { required: false }), bumpers('Blue')])];
    const result = computeReadiness(facts({ preMatchRuns, blockingRepairs: [{ id: 'r1', title: 'Arm chain off', late: true }] }), NOW);
    expect(codes(result)).toEqual(['bumper_mismatch', 'repair_blocks_match', 'checklist_incomplete', 'advisory_open']);
  });

  it('reads every pre-match run of the match', () => {
    const second: ReadinessRun = { name: 'Drive team', items: [item('Controller charged')], signOff: null };
    const result = computeReadiness(facts({ preMatchRuns: [...facts().preMatchRuns, second] }), NOW);
    expect(result.reasons.map((reason) => reason.message)).toEqual(['Drive team: 1 required item open (Controller charged)']);
  });

  it('takes a rule list, so a later area adds its rule without changing callers', () => {
    const always = () => [{ code: 'repair_blocks_match' as const, level: 'not_ready' as const, message: 'x' }];
    expect(computeReadiness(facts(), NOW, [...READINESS_RULES, always]).state).toBe('not_ready');
  });
});
