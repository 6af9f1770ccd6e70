import type { LotPlan, SpecBody } from '../../api/types';
import './plan.css';

/** The sampling plan in the inspector's terms: how many to pull, how many bad parts are allowed. */
export function PlanSummary({ plan, sampling }: { plan: LotPlan; sampling: SpecBody['sampling'] }) {
  return (
    <div className="plan-summary" data-testid="plan-summary">
      <div className="plan-figure">
        <span className="plan-number" data-testid="plan-sample-size">
          {plan.sampleSize}
        </span>
        <span>parts to check</span>
      </div>
      <div className="plan-figure plan-accept">
        <span className="plan-number" data-testid="plan-accept">
          {plan.accept}
        </span>
        <span>bad parts still pass (Ac)</span>
      </div>
      <div className="plan-figure plan-reject">
        <span className="plan-number" data-testid="plan-reject">
          {plan.reject}
        </span>
        <span>bad parts flag the lot (Re)</span>
      </div>
      <p className="plan-basis">
        ISO 2859-1 single sampling, code letter {plan.codeLetter}
        {plan.planLetter && plan.planLetter !== plan.codeLetter && ` (plan of ${plan.planLetter})`},
        level {sampling.level}, AQL {sampling.aql} %, {sampling.severity} inspection.
      </p>
    </div>
  );
}
