import { MODES, type PathStability } from '../../../engine';
import { formatNumber } from '../format';
import type { FitOutcome } from './fitJob';

/** The scan covers λ from 1 out to 10 in tension and in to 0.1 in compression. */
const SCAN_END = { tension: 10, compression: 0.1 } as const;

function pathText(
  path: PathStability,
  side: keyof typeof SCAN_END,
): { text: string; bad: boolean } {
  if (path.firstUnstableStretch !== null) {
    return { text: `unstable from λ = ${formatNumber(path.firstUnstableStretch)}`, bad: true };
  }
  const end = path.limitStretch ?? SCAN_END[side];
  const monotonic =
    path.firstNonMonotonicStretch === null
      ? ''
      : `; P stops rising at λ = ${formatNumber(path.firstNonMonotonicStretch)}`;
  const limit = path.limitStretch === null ? '' : ' (where the model ends)';
  return { text: `stable to λ = ${formatNumber(end)}${limit}${monotonic}`, bad: monotonic !== '' };
}

/** Drucker stability and monotonic stress along each test path, in tension and compression. */
export function StabilityTable({ outcomes }: { outcomes: FitOutcome[] }) {
  const fitted = outcomes.flatMap((o) =>
    'result' in o ? [{ label: o.label, stability: o.result.stability }] : [],
  );
  if (fitted.length === 0) return null;
  return (
    <div className="desk-scroll">
      <table className="desk-table" aria-label="Stability">
        <thead>
          <tr>
            <th scope="col">model</th>
            <th scope="col">mode</th>
            <th scope="col">tension (λ &gt; 1)</th>
            <th scope="col">compression (λ &lt; 1)</th>
          </tr>
        </thead>
        <tbody>
          {fitted.flatMap(({ label, stability }) =>
            MODES.map((mode, i) => {
              const tension = pathText(stability[mode].tension, 'tension');
              const compression = pathText(stability[mode].compression, 'compression');
              return (
                <tr key={`${label}-${mode}`}>
                  <td>{i === 0 ? label : ''}</td>
                  <td>{mode}</td>
                  <td className={tension.bad ? 'desk-problem' : undefined}>{tension.text}</td>
                  <td className={compression.bad ? 'desk-problem' : undefined}>
                    {compression.text}
                  </td>
                </tr>
              );
            }),
          )}
        </tbody>
      </table>
    </div>
  );
}
