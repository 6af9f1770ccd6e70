import type { LotVerdict } from '../../engine/index';
import type { LotPlan } from '../../api/types';
import './lot-standing.css';

/** Where the lot stands against its plan, in one sentence the whole crew can read. */
export function LotStanding({ verdict, plan }: { verdict: LotVerdict; plan: LotPlan }) {
  const headline = { reject: 'Flagged', accept: 'Passes', open: 'Still checking' }[
    verdict.decision
  ];
  return (
    <div
      className={`lot-standing lot-standing-${verdict.decision}`}
      data-testid="lot-standing"
      data-decision={verdict.decision}
    >
      <span className="lot-standing-count">
        {verdict.inspected}/{plan.sampleSize}
      </span>
      <span>
        <strong>{headline}.</strong> {verdict.reason}
      </span>
    </div>
  );
}
