import type { PartVerdict } from '../../engine/index';
import { StandingBadge } from './StandingBadge';
import './verdict-panel.css';

const NAMES: Record<string, string> = {
  load: 'Load',
  hardness: 'Hardness',
  thickness: 'Thickness',
  diameter: 'Diameter',
  outerDiameter: 'Outside diameter',
  innerDiameter: 'Inside diameter',
  side: 'Side',
  length: 'Length',
  width: 'Width',
  'compression-set': 'Compression set',
  defects: 'Visual',
};

/** The engine's verdict on the part as typed so far, with its reasons in words and numbers. */
export function VerdictPanel({ verdict, problem }: { verdict?: PartVerdict; problem?: string }) {
  return (
    <section className="verdict-panel" aria-live="polite" data-testid="verdict-panel">
      <h2>
        Verdict{' '}
        {verdict && (
          <span data-testid="verdict-overall">
            <StandingBadge standing={verdict.status} />
          </span>
        )}
      </h2>
      {problem && (
        <p className="field-error" role="alert">
          {problem}
        </p>
      )}
      {!verdict && !problem && <p>Type a value to see how the part stands.</p>}
      {verdict && (
        <ul>
          {verdict.characteristics
            .filter((c) => c.characteristic !== 'defects')
            .map((c) => (
              <li key={c.characteristic} data-characteristic={c.characteristic}>
                <div className="verdict-line">
                  <strong>{NAMES[c.characteristic] ?? c.characteristic}</strong>
                  <StandingBadge standing={c.status} />
                </div>
                <p className="verdict-reason" data-testid={`reason-${c.characteristic}`}>
                  {c.reason}
                </p>
              </li>
            ))}
        </ul>
      )}
      {verdict?.flags.map((flag) => (
        <p key={flag.code} className="verdict-flag">
          {flag.message}
        </p>
      ))}
    </section>
  );
}
