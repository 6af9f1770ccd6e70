import type { DeskSpecBody, DimensionName } from '../../../api/desk/types';
import * as engine from '../../../engine';
import {
  acceptanceWindows,
  expectedLoad,
  loadLimits,
  moldedTolerance,
  samplingPlan,
  specLoadCase,
  specLoadTolerance,
  type AcceptanceWindows,
  type DimensionKind,
  type ExpectedLoad,
  type PartSpec,
  type SamplingPlan,
  type ToleranceClass,
} from '../../../engine';
import { loadCurve, type CurvePoint } from '../../../inspect/loadCurve';
import { engineAnswer, type EngineAnswer } from '../engineAnswer';
import { SHAPE_DIMENSIONS, type Shape } from './specForm';

export interface SpecDerivation {
  load: ExpectedLoad;
  limits: { lowerLoad: number; upperLoad: number };
  windows: AcceptanceWindows;
  curve: CurvePoint[];
}

/** Everything the engine works out from a part spec: load and band, windows, the load curve. */
export function deriveSpec(spec: PartSpec): EngineAnswer<SpecDerivation> {
  return engineAnswer(() => {
    const loadCase = specLoadCase(spec);
    const tolerance = specLoadTolerance(spec);
    const load = expectedLoad(loadCase);
    return {
      load,
      limits: loadLimits(load, tolerance),
      windows: acceptanceWindows(loadCase, tolerance),
      curve: loadCurve(engine, spec),
    };
  });
}

export interface DimensionToleranceRow {
  name: DimensionName;
  nominal: number;
  tolClass: ToleranceClass;
  kind: DimensionKind;
  plusMinus: EngineAnswer<number>;
}

/** ISO 3302-1 ± for each dimension of a shape, with the class and kind chosen for it. */
export function dimensionTolerances(
  shape: Shape,
  nominals: Partial<Record<DimensionName, number>>,
  tolerance: DeskSpecBody['tolerance'],
): DimensionToleranceRow[] {
  return SHAPE_DIMENSIONS[shape].map((name) => {
    const chosen = tolerance.dimensions?.[name];
    const tolClass = chosen?.class ?? tolerance.class;
    const kind = chosen?.kind ?? 'fixed';
    const nominal = nominals[name] ?? Number.NaN;
    return {
      name,
      nominal,
      tolClass,
      kind,
      plusMinus: engineAnswer(() => moldedTolerance(nominal, tolClass, kind)),
    };
  });
}

/** The same for a spec body. */
export function bodyTolerances(body: DeskSpecBody): DimensionToleranceRow[] {
  return dimensionTolerances(
    body.geometry.shape,
    body.geometry as unknown as Partial<Record<DimensionName, number>>,
    body.tolerance,
  );
}

/** The sampling plan this spec gives a lot of the stated size. */
export function planFor(body: DeskSpecBody, lotSize: number): EngineAnswer<SamplingPlan> {
  return engineAnswer(() => samplingPlan({ lotSize, ...body.sampling }));
}
