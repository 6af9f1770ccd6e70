import type { Geometry } from '../../../api/types';

interface Props {
  geometry: Geometry;
  bonded: boolean;
}

const PLAN_BOX = 170;
const PLAN_X = 30;
const PLAN_Y = 30;
const SIDE_X = 280;
const SIDE_BOTTOM = 170;
const MIN_SIDE_HEIGHT = 14;
const MAX_SIDE_HEIGHT = 130;
const PLATE = 8;

function mm(value: number): string {
  return Number(value.toPrecision(4)).toString();
}

/** Extent of the plan view, mm: [across the page, down the page]. */
function planExtent(geometry: Geometry): [number, number] {
  switch (geometry.shape) {
    case 'disc':
      return [geometry.diameter, geometry.diameter];
    case 'annulus':
      return [geometry.outerDiameter, geometry.outerDiameter];
    case 'square':
      return [geometry.side, geometry.side];
    case 'rectangle':
      return [geometry.length, geometry.width];
    case 'strip':
      // A strip is long by definition; draw a piece three widths long with broken ends.
      return [geometry.width * 3, geometry.width];
  }
}

function Arrowheads() {
  return (
    <defs>
      <marker
        id="desk-arrow"
        viewBox="0 0 10 10"
        refX="10"
        refY="5"
        markerWidth="7"
        markerHeight="7"
        orient="auto-start-reverse"
      >
        <path d="M0,0 L10,5 L0,10 z" fill="currentColor" />
      </marker>
      <pattern
        id="desk-hatch"
        width="6"
        height="6"
        patternUnits="userSpaceOnUse"
        patternTransform="rotate(45)"
      >
        <line x1="0" y1="0" x2="0" y2="6" stroke="currentColor" strokeWidth="1.2" />
      </pattern>
    </defs>
  );
}

/** A dimension line with arrows at both ends and its value beside it. */
function Dimension(props: { x1: number; y1: number; x2: number; y2: number; label: string }) {
  const { x1, y1, x2, y2, label } = props;
  const vertical = x1 === x2;
  return (
    <g className="desk-dimension">
      <line
        x1={x1}
        y1={y1}
        x2={x2}
        y2={y2}
        stroke="currentColor"
        markerStart="url(#desk-arrow)"
        markerEnd="url(#desk-arrow)"
      />
      <text
        x={vertical ? x1 + 6 : (x1 + x2) / 2}
        y={vertical ? (y1 + y2) / 2 + 4 : y1 - 5}
        textAnchor={vertical ? 'start' : 'middle'}
        fontSize="14"
        fill="currentColor"
      >
        {label}
      </text>
    </g>
  );
}

function PlanView({ geometry, scale }: { geometry: Geometry; scale: number }) {
  const [across, down] = planExtent(geometry);
  const w = across * scale;
  const h = down * scale;
  const cx = PLAN_X + w / 2;
  const cy = PLAN_Y + h / 2;
  const below = PLAN_Y + h + 18;
  const fill = 'color-mix(in srgb, var(--gs-ink) 22%, transparent)';
  switch (geometry.shape) {
    case 'disc':
      return (
        <g>
          <circle cx={cx} cy={cy} r={w / 2} fill={fill} stroke="currentColor" />
          <Dimension
            x1={PLAN_X}
            y1={below}
            x2={PLAN_X + w}
            y2={below}
            label={`Ø ${mm(geometry.diameter)}`}
          />
        </g>
      );
    case 'annulus': {
      const inner = geometry.innerDiameter * scale;
      return (
        <g>
          <circle cx={cx} cy={cy} r={w / 2} fill={fill} stroke="currentColor" />
          <circle
            cx={cx}
            cy={cy}
            r={inner / 2}
            fill="var(--ion-item-background)"
            stroke="currentColor"
          />
          <Dimension
            x1={PLAN_X}
            y1={below}
            x2={PLAN_X + w}
            y2={below}
            label={`Ø ${mm(geometry.outerDiameter)}`}
          />
          <Dimension
            x1={cx - inner / 2}
            y1={cy}
            x2={cx + inner / 2}
            y2={cy}
            label={`Ø ${mm(geometry.innerDiameter)}`}
          />
        </g>
      );
    }
    case 'square':
    case 'rectangle': {
      const [first, second] =
        geometry.shape === 'square'
          ? [geometry.side, geometry.side]
          : [geometry.length, geometry.width];
      return (
        <g>
          <rect x={PLAN_X} y={PLAN_Y} width={w} height={h} fill={fill} stroke="currentColor" />
          <Dimension x1={PLAN_X} y1={below} x2={PLAN_X + w} y2={below} label={mm(first)} />
          {geometry.shape === 'rectangle' && (
            <Dimension
              x1={PLAN_X + w + 12}
              y1={PLAN_Y}
              x2={PLAN_X + w + 12}
              y2={PLAN_Y + h}
              label={mm(second)}
            />
          )}
        </g>
      );
    }
    case 'strip': {
      const zig = (x: number) =>
        `M${x},${PLAN_Y} l6,${h / 4} l-12,${h / 4} l12,${h / 4} l-6,${h / 4}`;
      return (
        <g>
          <rect x={PLAN_X} y={PLAN_Y} width={w} height={h} fill={fill} stroke="none" />
          <line x1={PLAN_X} y1={PLAN_Y} x2={PLAN_X + w} y2={PLAN_Y} stroke="currentColor" />
          <line x1={PLAN_X} y1={PLAN_Y + h} x2={PLAN_X + w} y2={PLAN_Y + h} stroke="currentColor" />
          <path d={zig(PLAN_X)} fill="none" stroke="currentColor" />
          <path d={zig(PLAN_X + w)} fill="none" stroke="currentColor" />
          <Dimension
            x1={PLAN_X + w + 14}
            y1={PLAN_Y}
            x2={PLAN_X + w + 14}
            y2={PLAN_Y + h}
            label={mm(geometry.width)}
          />
          <text x={cx} y={below + 4} textAnchor="middle" fontSize="13" fill="currentColor">
            long strip: length ≫ width
          </text>
        </g>
      );
    }
  }
}

function SideView({
  geometry,
  scale,
  bonded,
}: {
  geometry: Geometry;
  scale: number;
  bonded: boolean;
}) {
  const [across] = planExtent(geometry);
  const w = Math.min(across * scale, 130);
  const trueHeight = geometry.thickness * scale;
  // Very thin or very tall layers are drawn at a readable height and marked as not to scale.
  const h = Math.min(Math.max(trueHeight, MIN_SIDE_HEIGHT), MAX_SIDE_HEIGHT);
  const top = SIDE_BOTTOM - h;
  return (
    <g>
      {bonded && (
        <>
          <rect
            x={SIDE_X - 6}
            y={top - PLATE}
            width={w + 12}
            height={PLATE}
            fill="url(#desk-hatch)"
            stroke="currentColor"
          />
          <rect
            x={SIDE_X - 6}
            y={SIDE_BOTTOM}
            width={w + 12}
            height={PLATE}
            fill="url(#desk-hatch)"
            stroke="currentColor"
          />
        </>
      )}
      <path
        d={`M${SIDE_X},${top} L${SIDE_X + w},${top} Q${SIDE_X + w + 6},${top + h / 2} ${SIDE_X + w},${SIDE_BOTTOM} L${SIDE_X},${SIDE_BOTTOM} Q${SIDE_X - 6},${top + h / 2} ${SIDE_X},${top} z`}
        fill="color-mix(in srgb, var(--gs-ink) 22%, transparent)"
        stroke="currentColor"
      />
      <Dimension
        x1={SIDE_X + w + 24}
        y1={top}
        x2={SIDE_X + w + 24}
        y2={SIDE_BOTTOM}
        label={`t ${mm(geometry.thickness)}`}
      />
      <text
        x={SIDE_X + w / 2}
        y={SIDE_BOTTOM + 26}
        textAnchor="middle"
        fontSize="13"
        fill="currentColor"
      >
        {bonded ? 'bonded to plates' : 'faces free to slip'}
        {h !== trueHeight ? ' · height not to scale' : ''}
      </text>
    </g>
  );
}

/** Plan and side view of the part with its dimensions (mm), redrawn as the numbers change. */
export function GeometryDrawing({ geometry, bonded }: Props) {
  const [across, down] = planExtent(geometry);
  const largest = Math.max(across, down, geometry.thickness);
  const usable = largest > 0 && Number.isFinite(largest);
  const scale = usable ? PLAN_BOX / largest : 1;
  return (
    <svg
      viewBox="0 0 500 250"
      role="img"
      aria-label={`Drawing of the ${geometry.shape}`}
      className="desk-drawing"
    >
      <Arrowheads />
      <text x={PLAN_X} y={16} fontSize="13" fill="currentColor">
        plan
      </text>
      <text x={SIDE_X} y={16} fontSize="13" fill="currentColor">
        side
      </text>
      {usable ? (
        <>
          <PlanView geometry={geometry} scale={scale} />
          <SideView geometry={geometry} scale={scale} bonded={bonded} />
        </>
      ) : (
        <text x={240} y={120} textAnchor="middle" fill="currentColor">
          Enter the dimensions to see the part.
        </text>
      )}
    </svg>
  );
}
