import { useId, useMemo, useState } from 'react';
import { MODES, type MaterialModel } from '../../../engine';
import { CurveChart } from '../charts/CurveChart';
import { SERIES_COLORS, stressCurve } from '../charts/curves';
import { formatNumber } from '../format';

interface Props {
  model: MaterialModel | null;
  mu0: number | null;
}

/** Uniaxial, equibiaxial and planar P(λ) of the formula at its current constant values. */
export function FormulaPreview({ model, mu0 }: Props) {
  const id = useId();
  const [upTo, setUpTo] = useState('3');
  const top = Number(upTo);
  const range = Number.isFinite(top) && top > 1 && top <= 20 ? top : 3;
  const series = useMemo(
    () =>
      model
        ? MODES.map((mode, i) => ({
            name: mode,
            kind: 'line' as const,
            color: SERIES_COLORS[i] ?? '#000',
            points: stressCurve(model, mode, 1, range),
          }))
        : [],
    [model, range],
  );
  return (
    <section className="desk-card" aria-label="Preview curves">
      <div className="desk-row desk-row--between">
        <h3>Curves at these values</h3>
        <div className="desk-field">
          <label htmlFor={`${id}-upto`}>stretch up to</label>
          <input
            id={`${id}-upto`}
            inputMode="decimal"
            value={upTo}
            onChange={(e) => setUpTo(e.target.value)}
          />
        </div>
      </div>
      {model ? (
        <>
          <p className="desk-muted">
            μ₀ = {formatNumber(mu0)} MPa · E₀ = 3μ₀ = {formatNumber(mu0 === null ? null : 3 * mu0)}{' '}
            MPa
          </p>
          <CurveChart series={series} xLabel="stretch λ" yLabel="nominal stress, MPa" />
        </>
      ) : (
        <p className="desk-muted">The curves appear when the formula reads correctly.</p>
      )}
    </section>
  );
}
