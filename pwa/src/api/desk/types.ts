import type {
  AgingPoint,
  FitResult,
  MaterialModel,
  Mode,
  SamplingLevel,
  Severity,
  ToleranceClass,
  DimensionKind,
} from '../../engine';

/** The plant server's shapes for the desk (api/src/ROUTES.md and .team/desk-api-requests.md). */

export type Polymer = 'NR' | 'EPDM' | 'NBR' | 'CR' | 'FKM' | 'VMQ' | 'SBR' | 'other';
export const POLYMERS: readonly Polymer[] = [
  'NR',
  'EPDM',
  'NBR',
  'CR',
  'FKM',
  'VMQ',
  'SBR',
  'other',
];

export type Objective = 'absolute' | 'relative';
export type ModeWeights = Partial<Record<Mode, number>>;

export interface Fit {
  id: string;
  compoundId: string;
  version: number;
  model: MaterialModel;
  objective: Objective;
  weights?: ModeWeights | null;
  testSetIds: string[];
  result: Omit<FitResult, 'model'>;
  status: 'draft' | 'published';
  note?: string | null;
  createdAt?: string;
  publishedAt: string | null;
}

export interface Compound {
  id: string;
  code: string;
  name: string;
  polymer: Polymer;
  hardnessShoreA: number;
  bulkModulusMPa?: number | null;
  notes?: string;
  currentFitId: string | null;
  currentFit: Fit | null;
}

export interface StressPoint {
  stretch: number;
  stress: number;
}

export interface NewTestSet {
  name: string;
  mode: Mode;
  temperatureC?: number;
  points: StressPoint[];
}

export interface TestSet extends NewTestSet {
  id: string;
  compoundId: string;
  createdAt?: string;
}

export interface CompoundDetail extends Compound {
  testSets: TestSet[];
  fits: Fit[];
}

export interface NewCompound {
  code: string;
  name: string;
  polymer: Polymer;
  hardnessShoreA: number;
  bulkModulusMPa?: number;
  notes?: string;
}

export interface NewAgingSet {
  name: string;
  thresholdPercent: number;
  points: AgingPoint[];
}

export interface AgingSet extends NewAgingSet {
  id: string;
  compoundId: string;
  createdAt: string;
}

export type DimensionName =
  'thickness' | 'diameter' | 'outerDiameter' | 'innerDiameter' | 'side' | 'length' | 'width';

export interface DimensionTolerance {
  class: ToleranceClass;
  kind: DimensionKind;
}

export interface SpecBody {
  geometry: Geometry;
  bonded: boolean;
  compoundId: string;
  testDeflection: number;
  loadTolerancePercent: number;
  tolerance: {
    class: ToleranceClass;
    dimensions?: Partial<Record<DimensionName, DimensionTolerance>>;
  };
  hardness: { nominal: number; tolerance: number };
  compressionSetLimitPercent?: number;
  compressionSetCondition?: { temperatureC: number; hours: number };
  sampling: { level: SamplingLevel; aql: number; severity: Severity };
  note?: string;
}

export interface SpecRevision {
  id: string;
  specId: string;
  revision: number;
  status: 'draft' | 'released';
  body: SpecBody;
  fit: Fit | null;
  derived: Record<string, unknown> | null;
  createdAt?: string;
  releasedAt: string | null;
  releasedBy: string | null;
}

export interface Spec {
  id: string;
  partNumber: string;
  name: string;
  description: string;
  currentRevisionId: string | null;
  currentRevision: SpecRevision | null;
}

export interface SpecDetail extends Spec {
  revisions: SpecRevision[];
}

export interface NewSpec {
  partNumber: string;
  name: string;
  description?: string;
}

export interface MeasurementRow {
  inspectionId: string;
  lotId: string;
  lotNumber: string;
  specRevisionId: string;
  revision: number;
  pressId: string;
  pressCode: string;
  cavity: number;
  moldedAt: string;
  sampleIndex: number;
  recordedAt: string;
  thickness: number | null;
  hardness: number | null;
  load: number | null;
  conforming: boolean;
}
