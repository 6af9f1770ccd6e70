import { CurveChart, type Series } from '../desk/charts/CurveChart';
import type { CurvePoint } from '../../inspect/loadCurve';

export interface MeasuredLoad {
  sampleIndex: number;
  load: number;
}

interface LoadChartProps {
  curve: CurvePoint[];
  testDeflection: number;
  measured: MeasuredLoad[];
  band: { lowerLoad: number; upperLoad: number };
}

/**
 * Each sampled part's load at the test deflection against the expected load–deflection curve
 * and its tolerance limits. Drawn with the desk's chart (recharts), so it loads on demand.
 */
export function LoadChart({ curve, testDeflection, measured, band }: LoadChartProps) {
  const line = (pick: (p: CurvePoint) => number) =>
    curve.map((p) => ({ x: p.deflection, y: pick(p) }));
  const bounded = curve.some((p) => p.high !== p.low);
  const series: Series[] = [
    {
      name: bounded ? 'Expected (low)' : 'Expected',
      kind: 'line',
      color: 'var(--ion-color-primary)',
      points: line((p) => p.low),
    },
    ...(bounded
      ? [
          {
            name: 'Expected (high)',
            kind: 'line' as const,
            color: 'var(--ion-color-primary)',
            points: line((p) => p.high),
          },
        ]
      : []),
    {
      name: 'Lower limit',
      kind: 'line',
      color: 'var(--gs-near)',
      dashed: true,
      points: line((p) => p.lowerLimit),
    },
    {
      name: 'Upper limit',
      kind: 'line',
      color: 'var(--gs-near)',
      dashed: true,
      points: line((p) => p.upperLimit),
    },
    {
      name: 'Measured parts',
      kind: 'points',
      color: 'var(--gs-out)',
      points: measured.map((m) => ({ x: testDeflection, y: m.load })),
    },
  ];
  return (
    <CurveChart
      series={series}
      xLabel="Deflection, mm"
      yLabel="Load, N"
      markX={{ x: testDeflection, label: 'test deflection' }}
      bandY={{ from: band.lowerLoad, to: band.upperLoad }}
      height={340}
    />
  );
}
