import {
  CartesianGrid,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { formatNumber } from '../format';

export interface ControlPoint {
  label: string;
  value: number;
  out: boolean;
  lotId: string;
}

interface Props {
  title: string;
  points: ControlPoint[];
  centre: number;
  upper: number;
  lower: number;
  onOpenLot(lotId: string): void;
}

interface DotProps {
  cx?: number;
  cy?: number;
  payload?: ControlPoint;
  onOpenLot(lotId: string): void;
}

/** A subgroup's point; one outside the limits is red and opens its lot. */
function ControlDot({ cx, cy, payload, onOpenLot }: DotProps) {
  if (cx === undefined || cy === undefined || !payload) return null;
  return (
    <circle
      cx={cx}
      cy={cy}
      r={payload.out ? 6 : 3.5}
      fill={payload.out ? 'var(--gs-out)' : 'var(--gs-ink)'}
      stroke="none"
      style={{ cursor: payload.out ? 'pointer' : 'default' }}
      onClick={() => payload.out && onOpenLot(payload.lotId)}
    >
      <title>{`${payload.label}: ${formatNumber(payload.value)}`}</title>
    </circle>
  );
}

/** One Shewhart chart: subgroup values in molding order against the centre line and limits. */
export function ControlChart({ title, points, centre, upper, lower, onOpenLot }: Props) {
  const reference = (y: number, label: string, dashed: boolean) => (
    <ReferenceLine
      y={y}
      ifOverflow="extendDomain"
      stroke={dashed ? 'var(--gs-out)' : 'var(--gs-within)'}
      strokeDasharray={dashed ? '6 4' : undefined}
      label={{ value: `${label} ${formatNumber(y)}`, position: 'right', fontSize: 11 }}
    />
  );
  return (
    <figure className="desk-card" style={{ margin: 0 }} aria-label={title}>
      <figcaption>
        <strong>{title}</strong>
      </figcaption>
      <div style={{ width: '100%', height: 240 }}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={points} margin={{ top: 8, right: 96, bottom: 8, left: 8 }}>
            <CartesianGrid strokeDasharray="3 3" opacity={0.4} />
            <XAxis dataKey="label" tick={{ fontSize: 11 }} interval="preserveStartEnd" />
            <YAxis
              domain={['auto', 'auto']}
              tickFormatter={(v: number) => formatNumber(v, 3)}
              tick={{ fontSize: 11 }}
              width={56}
            />
            <Tooltip formatter={(v) => formatNumber(Number(v))} />
            {reference(upper, 'UCL', true)}
            {reference(centre, 'CL', false)}
            {reference(lower, 'LCL', true)}
            <Line
              dataKey="value"
              stroke="var(--gs-ink)"
              dot={<ControlDot onOpenLot={onOpenLot} />}
              activeDot={false}
              isAnimationActive={false}
            />
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
