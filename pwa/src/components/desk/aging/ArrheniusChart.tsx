import type { AgingPoint, ArrheniusFit } from '../../../engine';
import { arrheniusLife } from '../../../engine';
import { CurveChart } from '../charts/CurveChart';

interface Props {
  points: AgingPoint[];
  fit: ArrheniusFit;
  /** Temperatures to draw the line down (or up) to, °C, besides the tested ones. */
  extendToC: number[];
}

const inverseKiloKelvin = (c: number) => 1000 / (c + 273.15);

/** ln t against 1000/T: the fitted line with its confidence band, and the measured points. */
export function ArrheniusChart({ points, fit, extendToC }: Props) {
  const temperatures = [...points.map((p) => p.temperatureC), ...extendToC];
  const low = Math.min(...temperatures);
  const high = Math.max(...temperatures);
  const steps = 40;
  const line = Array.from({ length: steps + 1 }, (_, i) => {
    const c = low + ((high - low) * i) / steps;
    return { c, life: arrheniusLife(fit, c) };
  });
  const x = (c: number) => inverseKiloKelvin(c);
  return (
    <CurveChart
      xLabel="1000 / T, 1/K"
      yLabel="ln(hours)"
      series={[
        {
          name: 'measured',
          kind: 'points',
          color: '#17434f',
          points: points.map((p) => ({ x: x(p.temperatureC), y: Math.log(p.hours) })),
        },
        {
          name: 'fit',
          kind: 'line',
          color: '#e39a2d',
          points: line.map(({ c, life }) => ({ x: x(c), y: Math.log(life.hours) })),
        },
        {
          name: 'band low',
          kind: 'line',
          color: '#b7791f',
          dashed: true,
          points: line.map(({ c, life }) => ({ x: x(c), y: Math.log(life.lowHours) })),
        },
        {
          name: 'band high',
          kind: 'line',
          color: '#b7791f',
          dashed: true,
          points: line.map(({ c, life }) => ({ x: x(c), y: Math.log(life.highHours) })),
        },
      ]}
    />
  );
}
