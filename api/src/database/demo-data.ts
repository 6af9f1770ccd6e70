import type { CreateCompoundDto } from '../compounds/dto/compound.dto.js';
import type { ModelBody } from '../compounds/dto/model.dto.js';
import type { Mode } from '../engine.js';
import type { CreatePressDto } from '../presses/dto/press.dto.js';
import type { SpecBody } from '../specs/dto/spec-body.dto.js';
import type { Role } from '../users/entities/user.entity.js';

/*
 * The invented demo plant of DESIGN §8. Every name, number and test result here is made up; the
 * stress–strain points are invented lab readings (λ, nominal stress in MPa) with scatter.
 */

export const DEMO_PEOPLE: { role: Role; name: string }[] = [
  { role: 'inspector', name: 'Ines Demo' },
  { role: 'supervisor', name: 'Sam Demo' },
  { role: 'quality', name: 'Quinn Demo' },
  { role: 'admin', name: 'Ada Demo' },
];

export const DEMO_PRESSES: CreatePressDto[] = [
  { code: 'P1', name: 'Compression press 1', kind: 'compression', clampForceKn: 2450 },
  { code: 'P2', name: 'Compression press 2', kind: 'compression', clampForceKn: 3920 },
  { code: 'P3', name: 'Transfer press 3', kind: 'transfer', clampForceKn: 1960 },
  { code: 'P4', name: 'Injection press 4', kind: 'injection', clampForceKn: 2940 },
];

type Points = [stretch: number, stress: number][];

export interface DemoCompound {
  compound: CreateCompoundDto;
  tests: Partial<Record<Mode, Points>>;
  /** The model the quality engineer fits, and the constants the fit starts from. */
  start: ModelBody;
}

export const DEMO_COMPOUNDS: DemoCompound[] = [
  {
    compound: {
      code: 'NR-55',
      name: 'Natural rubber, 55 Shore A, sulfur cure',
      polymer: 'NR',
      hardnessShoreA: 55,
    },
    start: { kind: 'yeoh', c10: 0.4, c20: -0.01, c30: 0.001 },
    // prettier-ignore
    tests: {
      uniaxial: [
        [1.05, 0.139], [1.227, 0.561], [1.405, 0.867], [1.582, 1.122], [1.759, 1.36], [1.936, 1.547],
        [2.114, 1.716], [2.291, 1.914], [2.468, 2.097], [2.645, 2.283], [2.823, 2.523], [3, 2.794],
      ],
      equibiaxial: [
        [1.04, 0.218], [1.16, 0.664], [1.28, 0.947], [1.4, 1.151], [1.52, 1.299], [1.64, 1.398],
        [1.76, 1.545], [1.88, 1.66], [2, 1.827],
      ],
      planar: [
        [1.05, 0.186], [1.219, 0.647], [1.387, 0.983], [1.556, 1.248], [1.725, 1.444], [1.894, 1.62],
        [2.063, 1.78], [2.231, 1.96], [2.4, 2.128],
      ],
    },
  },
  {
    compound: {
      code: 'EPDM-65',
      name: 'EPDM, 65 Shore A, peroxide cure',
      polymer: 'EPDM',
      hardnessShoreA: 65,
      bulkModulusMPa: 1500,
    },
    start: { kind: 'mooney-rivlin', c10: 0.5, c01: 0.1 },
    // prettier-ignore
    tests: {
      uniaxial: [
        [1.05, 0.209], [1.227, 0.805], [1.405, 1.279], [1.582, 1.637], [1.759, 1.956], [1.936, 2.263],
        [2.114, 2.552], [2.291, 2.807], [2.468, 3.121], [2.645, 3.336], [2.823, 3.598], [3, 3.857],
      ],
      equibiaxial: [
        [1.04, 0.323], [1.16, 1.062], [1.28, 1.618], [1.4, 2.077], [1.52, 2.501], [1.64, 2.906],
        [1.76, 3.415], [1.88, 3.786], [2, 4.314],
      ],
      planar: [
        [1.05, 0.274], [1.219, 0.991], [1.387, 1.519], [1.556, 1.911], [1.725, 2.242], [1.894, 2.578],
        [2.063, 2.865], [2.231, 3.156], [2.4, 3.437],
      ],
    },
  },
  {
    compound: {
      code: 'NBR-70',
      name: 'Nitrile, 70 Shore A, oil resistant',
      polymer: 'NBR',
      hardnessShoreA: 70,
    },
    start: { kind: 'mooney-rivlin', c10: 0.6, c01: 0.1 },
    // prettier-ignore
    tests: {
      uniaxial: [
        [1.05, 0.26], [1.227, 1.012], [1.405, 1.595], [1.582, 2.054], [1.759, 2.524], [1.936, 2.875],
        [2.114, 3.274], [2.291, 3.595], [2.468, 3.926], [2.645, 4.233], [2.823, 4.546], [3, 4.881],
      ],
      equibiaxial: [
        [1.04, 0.411], [1.16, 1.311], [1.28, 1.984], [1.4, 2.495], [1.52, 3.017], [1.64, 3.478],
        [1.76, 3.965], [1.88, 4.484], [2, 5.085],
      ],
      planar: [
        [1.05, 0.346], [1.219, 1.212], [1.387, 1.882], [1.556, 2.345], [1.725, 2.808], [1.894, 3.18],
        [2.063, 3.54], [2.231, 3.999], [2.4, 4.247],
      ],
    },
  },
];

export interface DemoSpec {
  partNumber: string;
  name: string;
  description: string;
  compoundCode: string;
  body: Omit<SpecBody, 'compoundId'>;
  /** Typical lot sizes of this part. */
  lotSizes: number[];
}

const SAMPLING = { level: 'II', aql: 2.5, severity: 'normal' } as const;

export const DEMO_SPECS: DemoSpec[] = [
  {
    partNumber: 'GM-1040',
    name: 'Machinery mounting pad 80 × 80 × 12, bonded',
    description: 'Square pad vulcanised between two steel plates, under compressors and pumps.',
    compoundCode: 'NR-55',
    body: {
      geometry: { shape: 'square', side: 80, thickness: 12 },
      bonded: true,
      testDeflection: 1.2,
      loadTolerancePercent: 15,
      tolerance: { class: 'M2', dimensions: { thickness: { class: 'M2', kind: 'closure' } } },
      hardness: { nominal: 55, tolerance: 5 },
      compressionSetLimitPercent: 25,
      sampling: SAMPLING,
    },
    lotSizes: [120, 200, 300],
  },
  {
    partNumber: 'GB-2210',
    name: 'Bearing strip 50 × 10 × 400, unbonded',
    description: 'Plain strip laid under precast beams; faces held by friction only.',
    compoundCode: 'EPDM-65',
    body: {
      geometry: { shape: 'strip', width: 50, thickness: 10, length: 400 },
      bonded: false,
      testDeflection: 1,
      loadTolerancePercent: 20,
      tolerance: { class: 'M3' },
      hardness: { nominal: 65, tolerance: 5 },
      sampling: SAMPLING,
    },
    lotSizes: [60, 90, 150],
  },
  {
    partNumber: 'GS-3070',
    name: 'Bushing ring 70 / 30 × 15, bonded',
    description: 'Annular bushing bonded to a steel sleeve, loaded along its axis.',
    compoundCode: 'NBR-70',
    body: {
      geometry: { shape: 'annulus', outerDiameter: 70, innerDiameter: 30, thickness: 15 },
      bonded: true,
      testDeflection: 1.5,
      loadTolerancePercent: 15,
      tolerance: { class: 'M2' },
      hardness: { nominal: 70, tolerance: 5 },
      compressionSetLimitPercent: 30,
      sampling: SAMPLING,
    },
    lotSizes: [200, 400, 500],
  },
  {
    partNumber: 'GD-4250',
    name: 'Dock bumper block 250 × 150 × 60, bonded backing plate',
    description: 'Block bumper on a steel backing plate for loading docks.',
    compoundCode: 'EPDM-65',
    body: {
      geometry: { shape: 'rectangle', length: 250, width: 150, thickness: 60 },
      bonded: true,
      testDeflection: 6,
      loadTolerancePercent: 20,
      tolerance: { class: 'M4' },
      hardness: { nominal: 65, tolerance: 5 },
      sampling: { level: 'II', aql: 4, severity: 'normal' },
    },
    lotSizes: [40, 60, 80],
  },
];
