import type { DeskSpecBody, DimensionName, DimensionTolerance } from '../../../api/desk/types';
import type { Geometry } from '../../../api/types';
import type {
  BulkCorrection,
  InspectionLevel,
  InspectionSeverity,
  ToleranceClass,
} from '../../../engine';

export type Shape = Geometry['shape'];

/** The dimensions each shape is drawn and toleranced by, in the order the form asks for them. */
export const SHAPE_DIMENSIONS: Record<Shape, DimensionName[]> = {
  disc: ['diameter', 'thickness'],
  annulus: ['outerDiameter', 'innerDiameter', 'thickness'],
  square: ['side', 'thickness'],
  rectangle: ['length', 'width', 'thickness'],
  strip: ['width', 'thickness'],
};

export const SHAPE_NAMES: Record<Shape, string> = {
  disc: 'disc',
  annulus: 'ring (annulus)',
  square: 'square block',
  rectangle: 'rectangular block',
  strip: 'long strip',
};

export const DIMENSION_LABELS: Record<DimensionName, string> = {
  thickness: 'rubber thickness t',
  diameter: 'diameter D',
  outerDiameter: 'outer diameter Dₒ',
  innerDiameter: 'inner diameter Dᵢ',
  side: 'side a',
  length: 'length L',
  width: 'width W',
};

/** What the editor holds: numbers as typed, so a half-typed value is never lost. */
export interface SpecFields {
  shape: Shape;
  dimensions: Partial<Record<DimensionName, string>>;
  bonded: boolean;
  unbondedFaces: 'friction' | 'lubricated';
  compoundId: string;
  testDeflection: string;
  loadTolerancePercent: string;
  defaultClass: ToleranceClass;
  dimensionTolerances: Partial<Record<DimensionName, DimensionTolerance>>;
  hardnessNominal: string;
  hardnessTolerance: string;
  setLimitPercent: string;
  setTemperatureC: string;
  setHours: string;
  level: InspectionLevel;
  aql: string;
  severity: InspectionSeverity;
  /** Empty: the engine's default. */
  bulkCorrection: BulkCorrection | '';
  materialFactor: string;
  note: string;
}

export type FieldName =
  | DimensionName
  | 'compoundId'
  | 'testDeflection'
  | 'loadTolerancePercent'
  | 'hardnessNominal'
  | 'hardnessTolerance'
  | 'setLimitPercent'
  | 'setTemperatureC'
  | 'setHours'
  | 'materialFactor';

export type FieldProblems = Partial<Record<FieldName, string>>;

const text = (value: number | undefined) => (value === undefined ? '' : String(value));

export function fieldsFromBody(body: DeskSpecBody): SpecFields {
  const record = body.geometry as unknown as Partial<Record<DimensionName, number>>;
  return {
    shape: body.geometry.shape,
    dimensions: Object.fromEntries(
      SHAPE_DIMENSIONS[body.geometry.shape].map((name) => [name, text(record[name])]),
    ),
    bonded: body.bonded,
    unbondedFaces: body.unbondedFaces ?? 'friction',
    compoundId: body.compoundId,
    testDeflection: text(body.testDeflection),
    loadTolerancePercent: text(body.loadTolerancePercent),
    defaultClass: body.tolerance.class,
    dimensionTolerances: { ...body.tolerance.dimensions },
    hardnessNominal: text(body.hardness.nominal),
    hardnessTolerance: text(body.hardness.tolerance),
    setLimitPercent: text(body.compressionSetLimitPercent),
    setTemperatureC: text(body.compressionSetCondition?.temperatureC),
    setHours: text(body.compressionSetCondition?.hours),
    level: body.sampling.level,
    aql: text(body.sampling.aql),
    severity: body.sampling.severity,
    bulkCorrection: body.mechanics?.bulkCorrection ?? '',
    materialFactor: text(body.mechanics?.materialFactor),
    note: body.note ?? '',
  };
}

/** A new part's starting point: a bonded disc pad, M3 (the usual default class), level II. */
export const NEW_SPEC_FIELDS: SpecFields = {
  shape: 'disc',
  dimensions: { diameter: '100', thickness: '10' },
  bonded: true,
  unbondedFaces: 'friction',
  compoundId: '',
  testDeflection: '1',
  loadTolerancePercent: '10',
  defaultClass: 'M3',
  dimensionTolerances: {},
  hardnessNominal: '60',
  hardnessTolerance: '5',
  setLimitPercent: '',
  setTemperatureC: '',
  setHours: '',
  level: 'II',
  aql: '1',
  severity: 'normal',
  bulkCorrection: '',
  materialFactor: '',
  note: '',
};

function numberIn(value: string, min: number, max: number, inclusiveMin: boolean): number | null {
  if (value.trim() === '') return null;
  const n = Number(value);
  if (!Number.isFinite(n)) return null;
  return (inclusiveMin ? n >= min : n > min) && n <= max ? n : null;
}

export type BodyResult =
  { body: DeskSpecBody; problems: FieldProblems } | { body: null; problems: FieldProblems };

/** Reads typed numbers, noting a problem for each one that is out of its range. */
function numberReader(problems: FieldProblems) {
  const required = (
    field: FieldName,
    value: string,
    [min, max, inclusive]: Range,
    problem: string,
  ) => {
    const n = numberIn(value, min, max, inclusive);
    if (n === null) problems[field] = problem;
    return n ?? Number.NaN;
  };
  const optional = (field: FieldName, value: string, range: Range, problem: string) =>
    value.trim() === '' ? undefined : required(field, value, range, problem);
  return { required, optional };
}

/** min, max and whether min itself is allowed. */
type Range = [number, number, boolean];

// The server's limits (api/src/specs/dto/spec-body.dto.ts), so a body that passes here is accepted.
const LENGTH: Range = [0, 10_000, false];
const LOAD_TOLERANCE: Range = [0.5, 50, true];
// Durometer readings under about 20 or over 90 Shore A are unreliable (REFERENCES §6).
const HARDNESS: Range = [20, 90, true];
const HARDNESS_TOLERANCE: Range = [1, 15, true];
const SET_LIMIT: Range = [1, 100, true];
const SET_TEMPERATURE: Range = [-100, 400, true];
const SET_HOURS: Range = [0, 100_000, false];
const MATERIAL_FACTOR: Range = [0, 2, true];

/** The server's body from the fields, or what keeps it from being one, field by field. */
export function bodyFromFields(fields: SpecFields): BodyResult {
  const problems: FieldProblems = {};
  const { required, optional } = numberReader(problems);
  const dims: Partial<Record<DimensionName, number>> = {};
  for (const name of SHAPE_DIMENSIONS[fields.shape]) {
    dims[name] = required(name, fields.dimensions[name] ?? '', LENGTH, 'a length above 0 mm');
  }
  if (!fields.compoundId) problems.compoundId = 'choose the compound';
  const deflection = required(
    'testDeflection',
    fields.testDeflection,
    LENGTH,
    'a deflection above 0 mm',
  );
  if (dims.thickness !== undefined && deflection >= dims.thickness) {
    problems.testDeflection = `must be less than the thickness ${dims.thickness} mm`;
  }
  const loadTolerance = required(
    'loadTolerancePercent',
    fields.loadTolerancePercent,
    LOAD_TOLERANCE,
    'a tolerance from 0.5 to 50 %',
  );
  const hardness = required(
    'hardnessNominal',
    fields.hardnessNominal,
    HARDNESS,
    'Shore A from 20 to 90',
  );
  const hardnessTolerance = required(
    'hardnessTolerance',
    fields.hardnessTolerance,
    HARDNESS_TOLERANCE,
    'from 1 to 15 points',
  );
  const setLimit = optional(
    'setLimitPercent',
    fields.setLimitPercent,
    SET_LIMIT,
    'a percentage from 1 to 100, or empty',
  );
  const hasCondition = fields.setTemperatureC.trim() !== '' || fields.setHours.trim() !== '';
  const setTemperature = hasCondition
    ? required(
        'setTemperatureC',
        fields.setTemperatureC,
        SET_TEMPERATURE,
        'a temperature from −100 to 400 °C',
      )
    : Number.NaN;
  const setHours = hasCondition
    ? required('setHours', fields.setHours, SET_HOURS, 'hours above 0')
    : Number.NaN;
  const materialFactor = optional(
    'materialFactor',
    fields.materialFactor,
    MATERIAL_FACTOR,
    'from 0 to 2, or empty for the table',
  );
  if (Object.keys(problems).length > 0) return { body: null, problems };

  const dimensionTolerances = Object.fromEntries(
    Object.entries(fields.dimensionTolerances).filter(([name]) =>
      SHAPE_DIMENSIONS[fields.shape].includes(name as DimensionName),
    ),
  );
  const body: DeskSpecBody = {
    geometry: { shape: fields.shape, ...dims } as Geometry,
    bonded: fields.bonded,
    ...(fields.bonded ? {} : { unbondedFaces: fields.unbondedFaces }),
    compoundId: fields.compoundId,
    testDeflection: deflection,
    loadTolerancePercent: loadTolerance,
    tolerance: {
      class: fields.defaultClass,
      ...(Object.keys(dimensionTolerances).length ? { dimensions: dimensionTolerances } : {}),
    },
    hardness: { nominal: hardness, tolerance: hardnessTolerance },
    ...(setLimit === undefined ? {} : { compressionSetLimitPercent: setLimit }),
    ...(hasCondition
      ? {
          compressionSetCondition: { temperatureC: setTemperature, hours: setHours },
        }
      : {}),
    sampling: { level: fields.level, aql: Number(fields.aql), severity: fields.severity },
    ...(fields.bulkCorrection || materialFactor !== undefined
      ? {
          mechanics: {
            ...(fields.bulkCorrection ? { bulkCorrection: fields.bulkCorrection } : {}),
            ...(materialFactor === undefined ? {} : { materialFactor }),
          },
        }
      : {}),
    ...(fields.note.trim() ? { note: fields.note.trim() } : {}),
  };
  return { body, problems };
}
