import { EngineInputError, requirePositive } from './errors.js';
import { Real } from './real.js';
import type { Scalar } from './scalar.js';

/**
 * A single rubber layer between two loaded faces, mm, with its dimensions of type C so the
 * same shape carries plain numbers or perturbed scalars (for complex-step sensitivities).
 * A strip is long enough that its ends do not bulge; without `length` its area and loads are
 * per millimetre of length.
 */
export type GeometryOf<C> =
  | { readonly shape: 'disc'; readonly diameter: C; readonly thickness: C }
  | {
      readonly shape: 'annulus';
      readonly outerDiameter: C;
      readonly innerDiameter: C;
      readonly thickness: C;
    }
  | { readonly shape: 'square'; readonly side: C; readonly thickness: C }
  | { readonly shape: 'rectangle'; readonly length: C; readonly width: C; readonly thickness: C }
  | { readonly shape: 'strip'; readonly width: C; readonly thickness: C; readonly length?: C };

export type Geometry = GeometryOf<number>;
export type Shape = Geometry['shape'];
export type DimensionName =
  'thickness' | 'diameter' | 'outerDiameter' | 'innerDiameter' | 'side' | 'length' | 'width';

// Each shape's dimensions in one fixed order (the order of sensitivity vectors).
const DIMENSIONS: Readonly<Record<Shape, readonly DimensionName[]>> = {
  disc: ['thickness', 'diameter'],
  annulus: ['thickness', 'outerDiameter', 'innerDiameter'],
  square: ['thickness', 'side'],
  rectangle: ['thickness', 'length', 'width'],
  strip: ['thickness', 'width', 'length'],
};

/** The dimensions this geometry has (an absent strip length is left out). */
export function dimensionNames(geometry: GeometryOf<unknown>): DimensionName[] {
  const record = geometry as unknown as Partial<Record<DimensionName, unknown>>;
  return DIMENSIONS[geometry.shape].filter((name) => record[name] !== undefined);
}

/** The same geometry with every dimension passed through f. */
export function mapDimensions<A, B>(
  geometry: GeometryOf<A>,
  f: (value: A, name: DimensionName) => B,
): GeometryOf<B> {
  const record = geometry as unknown as Record<DimensionName, A>;
  const mapped: Record<string, unknown> = { shape: geometry.shape };
  for (const name of DIMENSIONS[geometry.shape]) {
    if (record[name] !== undefined) mapped[name] = f(record[name], name);
  }
  return mapped as unknown as GeometryOf<B>;
}

/** Throws EngineInputError unless every dimension is finite and positive and the shape holds together. */
export function checkGeometry(geometry: GeometryOf<{ re: number } | number>): void {
  if (!Object.hasOwn(DIMENSIONS, geometry?.shape)) {
    throw new EngineInputError('shape', `must be disc, annulus, square, rectangle or strip`);
  }
  const real = mapDimensions(geometry, (value, name) =>
    requirePositive(name, typeof value === 'number' ? value : value.re),
  );
  if (real.shape === 'annulus' && !(real.innerDiameter < real.outerDiameter)) {
    throw new EngineInputError(
      'innerDiameter',
      `must be below the outer diameter ${real.outerDiameter} mm, got ${real.innerDiameter}`,
    );
  }
}

/** Loaded (plan) area of one face, mm² — per mm of length for a strip without a length. */
export function loadedAreaOf<T extends Scalar<T>>(geometry: GeometryOf<T>): T {
  switch (geometry.shape) {
    case 'disc':
      return geometry.diameter.mul(geometry.diameter).mul(Math.PI / 4);
    case 'annulus': {
      const { outerDiameter: o, innerDiameter: i } = geometry;
      return o
        .mul(o)
        .sub(i.mul(i))
        .mul(Math.PI / 4);
    }
    case 'square':
      return geometry.side.mul(geometry.side);
    case 'rectangle':
      return geometry.length.mul(geometry.width);
    case 'strip':
      return geometry.length ? geometry.width.mul(geometry.length) : geometry.width;
  }
}

/**
 * Shape factor S: one loaded area over the area free to bulge (REFERENCES §5): disc D/4t,
 * annulus (Dₒ − Dᵢ)/4t, square a/4t, rectangle LW/2t(L + W), long strip W/2t.
 */
export function shapeFactorOf<T extends Scalar<T>>(geometry: GeometryOf<T>): T {
  const t = geometry.thickness;
  switch (geometry.shape) {
    case 'disc':
      return geometry.diameter.div(t.mul(4));
    case 'annulus':
      return geometry.outerDiameter.sub(geometry.innerDiameter).div(t.mul(4));
    case 'square':
      return geometry.side.div(t.mul(4));
    case 'rectangle': {
      const { length: l, width: w } = geometry;
      return l.mul(w).div(t.mul(2).mul(l.add(w)));
    }
    case 'strip':
      return geometry.width.div(t.mul(2));
  }
}

function real(geometry: Geometry): GeometryOf<Real> {
  checkGeometry(geometry);
  return mapDimensions(geometry, (v) => new Real(v));
}

/** Shape factor S of a checked geometry. */
export function shapeFactor(geometry: Geometry): number {
  return shapeFactorOf(real(geometry)).re;
}

/** Loaded area (mm²) of a checked geometry. */
export function loadedArea(geometry: Geometry): number {
  return loadedAreaOf(real(geometry)).re;
}
