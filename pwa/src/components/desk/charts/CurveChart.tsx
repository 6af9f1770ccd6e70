import {
  CartesianGrid,
  ComposedChart,
  Legend,
  Line,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  Scatter,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { Point } from './curves';

export interface Series {
  name: string;
  points: Point[];
  /** Measured points are drawn as dots, model curves as lines. */
  kind: 'line' | 'points';
  color: string;
  dashed?: boolean;
}

interface Props {
  series: Series[];
  xLabel: string;
  yLabel: string;
  /** A marked x value (e.g. the test deflection) and a shaded y band (e.g. the load tolerance). */
  markX?: { x: number; label: string };
  bandY?: { from: number; to: number };
  height?: number;
}

const AXIS_FONT = { fontSize: 12 };

function tick(value: number): string {
  return Number(value.toPrecision(3)).toString();
}

/** Measured points against model curves on numeric axes; loaded only with desk screens. */
export function CurveChart({ series, xLabel, yLabel, markX, bandY, height = 300 }: Props) {
  return (
    <div style={{ width: '100%', height }}>
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid strokeDasharray="3 3" opacity={0.4} />
          <XAxis
            type="number"
            dataKey="x"
            domain={['auto', 'auto']}
            tickFormatter={tick}
            tick={AXIS_FONT}
            label={{ value: xLabel, position: 'insideBottom', offset: -12, ...AXIS_FONT }}
          />
          <YAxis
            type="number"
            dataKey="y"
            domain={['auto', 'auto']}
            tickFormatter={tick}
            tick={AXIS_FONT}
            width={56}
            label={{ value: yLabel, angle: -90, position: 'insideLeft', ...AXIS_FONT }}
          />
          {bandY && (
            <ReferenceArea
              y1={bandY.from}
              y2={bandY.to}
              fill="var(--gs-within)"
              fillOpacity={0.12}
            />
          )}
          {markX && (
            <ReferenceLine
              x={markX.x}
              stroke="var(--gs-amber)"
              label={{ value: markX.label, ...AXIS_FONT }}
            />
          )}
          <Tooltip
            formatter={(value) => tick(Number(value))}
            labelFormatter={(x) => `${xLabel} ${tick(Number(x))}`}
          />
          <Legend verticalAlign="top" height={28} />
          {series.map((s) =>
            s.kind === 'points' ? (
              <Scatter
                key={s.name}
                name={s.name}
                data={s.points}
                fill={s.color}
                isAnimationActive={false}
              />
            ) : (
              <Line
                key={s.name}
                name={s.name}
                data={s.points}
                dataKey="y"
                stroke={s.color}
                strokeWidth={2}
                strokeDasharray={s.dashed ? '6 4' : undefined}
                dot={false}
                isAnimationActive={false}
              />
            ),
          )}
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
