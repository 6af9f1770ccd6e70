import { describe, expect, it } from 'vitest';
import { samplingPlan, type InspectionSeverity } from './sampling.js';
import {
  initialSwitchingState,
  nextSwitchingState,
  resumeAfterCorrectiveAction,
  type SwitchingState,
} from './switching-rules.js';

// Switching rules of ISO 2859-1:1999 clause 9 (REFERENCES §9, [M] from memory).
const plan = (severity: InspectionSeverity) =>
  samplingPlan({ lotSize: 1000, level: 'II', aql: 1.0, severity });

function run(counts: number[], options: { reducedApproved?: boolean } = {}): SwitchingState {
  return counts.reduce(
    (state, nonconforming) =>
      nextSwitchingState(state, { plan: plan(state.severity), nonconforming, ...options }),
    initialSwitchingState(),
  );
}

describe('switching rules', () => {
  it('starts on normal inspection', () => {
    expect(initialSwitchingState().severity).toBe('normal');
  });

  it('normal → tightened when 2 of 5 or fewer consecutive lots are not accepted', () => {
    expect(run([3, 0, 0, 0]).severity).toBe('normal');
    expect(run([3, 0, 0, 0, 3]).severity).toBe('tightened');
    // The first rejection has left the five-lot window.
    expect(run([3, 0, 0, 0, 0, 3]).severity).toBe('normal');
  });

  it('tightened → normal after 5 consecutive accepted lots', () => {
    const tightened = run([3, 3]);
    expect(tightened.severity).toBe('tightened');
    const after = [0, 0, 0, 0].reduce(
      (s, n) => nextSwitchingState(s, { plan: plan('tightened'), nonconforming: n }),
      tightened,
    );
    expect(after.severity).toBe('tightened');
    expect(nextSwitchingState(after, { plan: plan('tightened'), nonconforming: 0 }).severity).toBe(
      'normal',
    );
  });

  it('5 lots not accepted on tightened discontinue inspection until corrective action', () => {
    let state = run([3, 3]);
    for (let i = 0; i < 5; i++) {
      state = nextSwitchingState(state, { plan: plan('tightened'), nonconforming: 2 });
    }
    expect(state.discontinued).toBe(true);
    expect(() => nextSwitchingState(state, { plan: plan('tightened'), nonconforming: 0 })).toThrow(
      expect.objectContaining({ field: 'state' }),
    );
    expect(resumeAfterCorrectiveAction(state)).toMatchObject({
      severity: 'tightened',
      discontinued: false,
    });
  });

  it('switching score: Ac 2 adds 3 when the lot also passes one AQL step tighter (Ac 1 at 0.65), else resets', () => {
    expect(run([1, 1, 0]).switchingScore).toBe(9);
    expect(run([1, 1, 2]).switchingScore).toBe(0);
  });

  it('Ac 0 or 1 plans add 2 per accepted lot', () => {
    const tightPlan = samplingPlan({ lotSize: 1000, level: 'II', aql: 0.65, severity: 'normal' });
    const state = nextSwitchingState(initialSwitchingState(), {
      plan: tightPlan,
      nonconforming: 1,
    });
    expect(state.switchingScore).toBe(2);
  });

  it('normal → reduced at score 30 only with steady production and approval', () => {
    const ten = Array<number>(10).fill(0);
    expect(run(ten).severity).toBe('normal');
    expect(run(ten).switchingScore).toBe(30);
    expect(run(ten, { reducedApproved: true }).severity).toBe('reduced');
  });

  it('reduced → normal on a count past Ac (also inside the gap) or unsteady production', () => {
    const reduced = run(Array<number>(10).fill(0), { reducedApproved: true });
    const reducedPlan = plan('reduced');
    expect(nextSwitchingState(reduced, { plan: reducedPlan, nonconforming: 1 }).severity).toBe(
      'reduced',
    );
    expect(nextSwitchingState(reduced, { plan: reducedPlan, nonconforming: 2 }).severity).toBe(
      'normal',
    );
    expect(
      nextSwitchingState(reduced, { plan: reducedPlan, nonconforming: 0, productionSteady: false })
        .severity,
    ).toBe('normal');
  });

  it('refuses a plan of another severity than the state', () => {
    expect(() =>
      nextSwitchingState(initialSwitchingState(), { plan: plan('tightened'), nonconforming: 0 }),
    ).toThrow(expect.objectContaining({ field: 'plan' }));
  });
});
