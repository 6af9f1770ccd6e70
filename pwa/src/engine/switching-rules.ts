import { EngineInputError } from './errors.js';
import { acceptOneStepTighter, type InspectionSeverity, type SamplingPlan } from './sampling.js';

/**
 * Where a stream of lots stands under the ISO 2859-1:1999 switching rules (clause 9 [M] from
 * memory; REFERENCES §9). Plain data, so the tablet and the server can store and replay it.
 */
export interface SwitchingState {
  severity: InspectionSeverity;
  /** Results of the last (up to) 5 lots on normal inspection, oldest first; true = accepted. */
  normalHistory: boolean[];
  /** Consecutive lots accepted on tightened inspection. */
  tightenedAcceptedRun: number;
  /** Lots not accepted since tightened inspection began. */
  tightenedRejected: number;
  switchingScore: number;
  /** Five lots not accepted on tightened: stop until the supplier has acted. */
  discontinued: boolean;
}

export interface LotOutcome {
  plan: SamplingPlan;
  nonconforming: number;
  /** Production at a steady rate (a condition for reduced inspection). Default true. */
  productionSteady?: boolean;
  /** The responsible authority approves reduced inspection. Default false. */
  reducedApproved?: boolean;
}

const REDUCED_SCORE = 30;

function startOf(severity: InspectionSeverity): SwitchingState {
  return {
    severity,
    normalHistory: [],
    tightenedAcceptedRun: 0,
    tightenedRejected: 0,
    switchingScore: 0,
    discontinued: false,
  };
}

/** A stream of lots starts on normal inspection. */
export function initialSwitchingState(): SwitchingState {
  return startOf('normal');
}

/** After corrective action, a discontinued stream resumes on tightened inspection. */
export function resumeAfterCorrectiveAction(state: SwitchingState): SwitchingState {
  if (!state.discontinued) throw new EngineInputError('state', 'inspection is not discontinued');
  return startOf('tightened');
}

// Switching score, single sampling (ISO 2859-1:1999 9.3.3.2 [M]): with Ac ≥ 2, +3 when the lot
// would also pass one AQL step tighter; with Ac 0 or 1, +2 when it passes; otherwise back to 0.
function nextScore(score: number, plan: SamplingPlan, nonconforming: number): number {
  if (plan.accept >= 2) {
    const tighter = acceptOneStepTighter(plan);
    return tighter !== null && nonconforming <= tighter ? score + 3 : 0;
  }
  return nonconforming <= plan.accept ? score + 2 : 0;
}

/** The state after one more lot's result on original inspection. */
export function nextSwitchingState(state: SwitchingState, outcome: LotOutcome): SwitchingState {
  const { plan, nonconforming, productionSteady = true, reducedApproved = false } = outcome;
  if (state.discontinued) {
    throw new EngineInputError(
      'state',
      'inspection is discontinued until corrective action is taken',
    );
  }
  if (plan.severity !== state.severity) {
    throw new EngineInputError(
      'plan',
      `is a ${plan.severity} plan but inspection is ${state.severity}`,
    );
  }
  if (!Number.isInteger(nonconforming) || nonconforming < 0 || nonconforming > plan.sampleSize) {
    throw new EngineInputError('nonconforming', `must be a whole number 0…${plan.sampleSize}`);
  }
  const accepted = nonconforming <= plan.accept;
  switch (state.severity) {
    case 'normal': {
      const normalHistory = [...state.normalHistory, accepted].slice(-5);
      // Two lots not accepted within five or fewer consecutive lots.
      if (normalHistory.filter((a) => !a).length >= 2) return startOf('tightened');
      const switchingScore = nextScore(state.switchingScore, plan, nonconforming);
      if (switchingScore >= REDUCED_SCORE && productionSteady && reducedApproved) {
        return startOf('reduced');
      }
      return { ...state, normalHistory, switchingScore };
    }
    case 'tightened': {
      if (accepted) {
        const run = state.tightenedAcceptedRun + 1;
        return run >= 5 ? startOf('normal') : { ...state, tightenedAcceptedRun: run };
      }
      const tightenedRejected = state.tightenedRejected + 1;
      return {
        ...state,
        tightenedAcceptedRun: 0,
        tightenedRejected,
        discontinued: tightenedRejected >= 5,
      };
    }
    case 'reduced':
      // Any lot past the accept number (rejected, or accepted inside the gap) or unsteady
      // production returns to normal.
      return accepted && productionSteady ? state : startOf('normal');
  }
}
