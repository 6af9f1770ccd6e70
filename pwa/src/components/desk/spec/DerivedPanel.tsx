import type { DimensionName } from '../../../api/desk/types';
import type { AcceptanceWindows, LoadEstimate, WindowEdge } from '../../../engine';
import { formatNumber } from '../format';
import { LoadChart } from '../../review/LoadChart';
import { DIMENSION_LABELS } from './specForm';
import type { SpecDerivation } from './specDerived';

interface Props {
  derivation: SpecDerivation;
  testDeflection: number;
  /** Faces held by friction: the engine answers with a low and a high bound. */
  bounded: boolean;
}

function Edge({ edge, unit, testId }: { edge: WindowEdge; unit: string; testId: string }) {
  if (edge.value === null) return <span className="desk-problem">{edge.reason}</span>;
  return (
    <span data-testid={testId}>
      {formatNumber(edge.value, 5)} {unit}{' '}
      <span className="desk-muted">({edge.iterations} Newton steps)</span>
    </span>
  );
}

/** One quantity's acceptance window, from its lower to its upper edge. */
function WindowRow({
  label,
  quantity,
  windows,
  unit,
}: {
  label: string;
  quantity: 'thickness' | 'hardness';
  windows: AcceptanceWindows;
  unit: string;
}) {
  return (
    <tr>
      <th scope="row">{label}</th>
      <td>
        <Edge edge={windows[quantity].min} unit={unit} testId={`window-${quantity}-min`} />
      </td>
      <td>
        <Edge edge={windows[quantity].max} unit={unit} testId={`window-${quantity}-max`} />
      </td>
    </tr>
  );
}

function Sensitivities({
  low,
  high,
  bounded,
}: {
  low: LoadEstimate;
  high: LoadEstimate;
  bounded: boolean;
}) {
  const names = Object.keys(high.sensitivities) as (DimensionName | 'hardness')[];
  return (
    <table className="desk-table desk-table--compact" aria-label="Sensitivities">
      <thead>
        <tr>
          <th scope="col">load changes with</th>
          {bounded && <th className="num">low estimate</th>}
          <th scope="col" className="num">
            {bounded ? 'high estimate' : 'per unit'}
          </th>
        </tr>
      </thead>
      <tbody>
        {names.map((name) => {
          const unit = name === 'hardness' ? 'N per Shore A point' : 'N per mm';
          return (
            <tr key={name}>
              <td>{name === 'hardness' ? 'hardness' : DIMENSION_LABELS[name]}</td>
              {bounded && (
                <td className="num">
                  {formatNumber(low.sensitivities[name])} {unit}
                </td>
              )}
              <td className="num" data-testid={`sensitivity-${name}`}>
                {formatNumber(high.sensitivities[name])} {unit}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

/** What the engine makes of the spec as it stands: load, band, stiffness, sensitivities, windows. */
export function DerivedPanel({ derivation, testDeflection, bounded }: Props) {
  const { load, limits, windows } = derivation;
  const loadText = bounded
    ? `${formatNumber(load.low.load)} – ${formatNumber(load.high.load)} N`
    : `${formatNumber(load.high.load)} N`;
  return (
    <section className="desk-card" aria-label="Worked out from the spec">
      <h3>Worked out from the spec</h3>
      <div className="desk-stats">
        <div className="desk-stat">
          shape factor S{' '}
          <strong data-testid="derived-shape-factor">{formatNumber(load.shapeFactor)}</strong>
        </div>
        <div className="desk-stat">
          loaded area <strong>{formatNumber(load.loadedArea)} mm²</strong>
        </div>
        <div className="desk-stat">
          strain at the test <strong>{formatNumber(load.strain * 100, 3)} %</strong>
        </div>
        <div className="desk-stat">
          expected load <strong data-testid="derived-load">{loadText}</strong>
        </div>
        <div className="desk-stat">
          accepted load{' '}
          <strong data-testid="derived-band">
            {formatNumber(limits.lowerLoad)} – {formatNumber(limits.upperLoad)} N
          </strong>
        </div>
        <div className="desk-stat">
          stiffness dF/dδ{' '}
          <strong data-testid="derived-stiffness">
            {bounded ? `${formatNumber(load.low.stiffness)} – ` : ''}
            {formatNumber(load.high.stiffness)} N/mm
          </strong>
        </div>
        <div className="desk-stat">
          Φ = E<sub>c</sub>/E<sub>0</sub>{' '}
          <strong>
            {bounded ? `${formatNumber(load.low.shapeAmplification)} – ` : ''}
            {formatNumber(load.high.shapeAmplification)}
          </strong>
        </div>
      </div>
      {bounded && (
        <p className="desk-muted">
          Faces held by friction lie between slipping (low) and bonded (high); both bounds are shown
          rather than a guessed factor between them.
        </p>
      )}
      {load.flags.length > 0 && (
        <ul className="desk-callout desk-callout--warn" aria-label="Validity">
          {load.flags.map((flag) => (
            <li key={flag.code}>{flag.message}</li>
          ))}
        </ul>
      )}
      <LoadChart
        curve={derivation.curve}
        testDeflection={testDeflection}
        measured={[]}
        band={limits}
      />
      <Sensitivities low={load.low} high={load.high} bounded={bounded} />
      <table className="desk-table" aria-label="Acceptance windows">
        <thead>
          <tr>
            <th scope="col">keeps the load inside its band</th>
            <th scope="col">from</th>
            <th scope="col">to</th>
          </tr>
        </thead>
        <tbody>
          <WindowRow
            label="thickness (other dimensions nominal)"
            quantity="thickness"
            windows={windows}
            unit="mm"
          />
          <WindowRow
            label="hardness (nominal size)"
            quantity="hardness"
            windows={windows}
            unit="Shore A"
          />
        </tbody>
      </table>
    </section>
  );
}
