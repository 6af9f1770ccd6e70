import type { Geometry, Measurements } from '../api/types';
import type { UnitSystem } from '../offline/db';
import { parseQuantity, type QuantityKind } from './units';

/** What the part form asks for: one text per field, exactly as typed. */
export type PartTexts = Record<string, string>;

export interface FieldSpec {
  name: string;
  label: string;
  kind: QuantityKind;
}

export type PlanDimension =
  'diameter' | 'outerDiameter' | 'innerDiameter' | 'side' | 'length' | 'width';

const PLAN_DIMENSIONS: Record<Geometry['shape'], [PlanDimension, string][]> = {
  disc: [['diameter', 'Diameter']],
  annulus: [
    ['outerDiameter', 'Outside diameter'],
    ['innerDiameter', 'Inside diameter'],
  ],
  square: [['side', 'Side']],
  rectangle: [
    ['length', 'Length'],
    ['width', 'Width'],
  ],
  strip: [['width', 'Width']],
};

export const HARDNESS_FIELDS = ['hardness1', 'hardness2', 'hardness3', 'hardness4', 'hardness5'];

/** The fields for a part of this shape, in the order an inspector measures. */
export function partFields(geometry: Geometry, readings: 3 | 5): FieldSpec[] {
  return [
    { name: 'thickness', label: 'Thickness', kind: 'length' },
    ...PLAN_DIMENSIONS[geometry.shape].map(([name, label]) => ({
      name,
      label,
      kind: 'length' as const,
    })),
    ...HARDNESS_FIELDS.slice(0, readings).map((name, i) => ({
      name,
      label: `Hardness ${i + 1}`,
      kind: 'hardness' as const,
    })),
    { name: 'load', label: 'Load at the test deflection', kind: 'force' },
  ];
}

export interface ReadPart {
  measurements: Measurements;
  /** Per field: why its text is not a value. */
  problems: Record<string, string>;
  /** Nothing typed yet. */
  empty: boolean;
}

/** The typed texts as SI measurements; a field left empty is simply not measured. */
export function readPart(
  fields: FieldSpec[],
  texts: Partial<PartTexts>,
  units: UnitSystem,
): ReadPart {
  const measurements: Measurements = {};
  const problems: Record<string, string> = {};
  const hardness: number[] = [];
  const dimensions: NonNullable<Measurements['dimensions']> = {};
  for (const field of fields) {
    const parsed = parseQuantity(texts[field.name] ?? '', field.kind, units);
    if ('problem' in parsed) problems[field.name] = parsed.problem;
    if (!('value' in parsed)) continue;
    if (field.kind === 'hardness') hardness.push(parsed.value);
    else if (field.name === 'thickness') measurements.thickness = parsed.value;
    else if (field.name === 'load') measurements.load = parsed.value;
    else dimensions[field.name as PlanDimension] = parsed.value;
  }
  if (hardness.length) measurements.hardness = hardness;
  if (Object.keys(dimensions).length) measurements.dimensions = dimensions;
  return { measurements, problems, empty: Object.keys(measurements).length === 0 };
}

/** A saved part's values back as texts in the person's units, to start a correction from. */
export function partTexts(
  fields: FieldSpec[],
  measurements: Measurements,
  format: (si: number, kind: QuantityKind) => string,
): PartTexts {
  const texts: PartTexts = {};
  for (const field of fields) {
    const hardnessIndex = HARDNESS_FIELDS.indexOf(field.name);
    const value =
      hardnessIndex >= 0
        ? measurements.hardness?.[hardnessIndex]
        : field.name === 'thickness'
          ? measurements.thickness
          : field.name === 'load'
            ? measurements.load
            : measurements.dimensions?.[field.name as PlanDimension];
    if (value !== undefined) texts[field.name] = format(value, field.kind);
  }
  return texts;
}
