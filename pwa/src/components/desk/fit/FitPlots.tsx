import { MODES, type FitPoint, type MaterialModel } from '../../../engine';
import { CurveChart, type Series } from '../charts/CurveChart';
import { SERIES_COLORS, stressCurve } from '../charts/curves';

interface Props {
  data: readonly FitPoint[];
  fits: { label: string; model: MaterialModel }[];
}

/** One chart per test mode: the measured points against every fitted curve over their range. */
export function FitPlots({ data, fits }: Props) {
  const modes = MODES.filter((mode) => data.some((p) => p.mode === mode));
  return (
    <div className="desk-grid desk-grid--2">
      {modes.map((mode) => {
        const points = data.filter((p) => p.mode === mode);
        const stretches = points.map((p) => p.stretch);
        const from = Math.min(1, ...stretches);
        const to = Math.max(1, ...stretches);
        const series: Series[] = [
          {
            name: 'test data',
            kind: 'points',
            color: '#1b2326',
            points: points.map((p) => ({ x: p.stretch, y: p.stress })),
          },
          ...fits.map((fit, i): Series => ({
            name: fit.label,
            kind: 'line',
            color: SERIES_COLORS[i % SERIES_COLORS.length] ?? '#17434f',
            points: stressCurve(fit.model, mode, from, to),
          })),
        ];
        return (
          <figure key={mode} className="desk-card" style={{ margin: 0 }} aria-label={`${mode} fit`}>
            <figcaption>
              <strong>{mode}</strong>
            </figcaption>
            <CurveChart series={series} xLabel="stretch λ" yLabel="nominal stress, MPa" />
          </figure>
        );
      })}
    </div>
  );
}
