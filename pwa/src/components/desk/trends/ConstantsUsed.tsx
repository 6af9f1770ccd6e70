import { XBAR_R_CONSTANTS, type XbarRLimits } from '../../../engine';
import { formatNumber } from '../format';

/** The tabulated factors behind the limits, so a reviewer can redo them by hand. */
export function ConstantsUsed({ limits }: { limits: XbarRLimits }) {
  const factors = XBAR_R_CONSTANTS[limits.subgroupSize];
  if (!factors) return null;
  return (
    <table className="desk-table desk-table--compact" aria-label="Chart constants">
      <thead>
        <tr>
          <th scope="col">n</th>
          <th scope="col">A2</th>
          <th scope="col">d2</th>
          <th scope="col">D3</th>
          <th scope="col">D4</th>
          <th scope="col">X̿</th>
          <th scope="col">R̄</th>
          <th scope="col">σ within = R̄/d2</th>
        </tr>
      </thead>
      <tbody>
        <tr>
          <td>{limits.subgroupSize}</td>
          <td>{factors.a2}</td>
          <td>{factors.d2}</td>
          <td>{factors.d3}</td>
          <td>{factors.d4}</td>
          <td>{formatNumber(limits.grandMean)}</td>
          <td>{formatNumber(limits.meanRange)}</td>
          <td>{formatNumber(limits.sigmaWithin)}</td>
        </tr>
      </tbody>
    </table>
  );
}
