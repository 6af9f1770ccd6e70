import type {
  AgingPoint,
  BulkCorrection,
  DimensionKind,
  FitResult,
  MaterialModel,
  Mode,
  ToleranceClass,
} from '../../engine';
import type {
  Compound,
  Defect,
  Disposition,
  Fit,
  Inspection,
  Lot,
  Press,
  SpecBody,
  SpecRevision,
} from '../types';

/*
 * What the desk reads and writes beyond the tablet's shapes (api/src/ROUTES.md plus the fields
 * asked for in .team/desk-api-requests.md). Each type extends the shared one in ../types.
 */

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

export type Objective = Fit['objective'];
export type ModeWeights = Partial<Record<Mode, number>>;

export interface FitRecord extends Fit {
  testSetIds: string[];
  result: Omit<FitResult, 'model'>;
  weights?: ModeWeights | null;
  note?: string | null;
  createdAt?: string;
}

export interface CompoundRecord extends Compound {
  polymer: Polymer;
  bulkModulusMPa?: number | null;
  notes?: string;
  currentFit: FitRecord | null;
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

export interface CompoundDetail extends CompoundRecord {
  testSets: TestSet[];
  fits: FitRecord[];
}

export interface NewCompound {
  code: string;
  name: string;
  polymer: Polymer;
  hardnessShoreA: number;
  bulkModulusMPa?: number;
  notes?: string;
}

export interface NewFit {
  model: MaterialModel;
  testSetIds: string[];
  objective: Objective;
  weights?: ModeWeights;
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

/** The geometry fields a tolerance class can be given for. */
export type DimensionName =
  'thickness' | 'diameter' | 'outerDiameter' | 'innerDiameter' | 'side' | 'length' | 'width';

export interface DimensionTolerance {
  class: ToleranceClass;
  kind: DimensionKind;
}

export interface DeskSpecBody extends Omit<SpecBody, 'tolerance'> {
  tolerance: {
    class: ToleranceClass;
    dimensions?: Partial<Record<DimensionName, DimensionTolerance>>;
  };
  /** Unbonded parts: faces held by 'friction' (bounds) or tested 'lubricated'. */
  unbondedFaces?: 'friction' | 'lubricated';
  mechanics?: { bulkCorrection?: BulkCorrection; materialFactor?: number };
  compressionSetCondition?: { temperatureC: number; hours: number };
  note?: string;
}

export interface DeskSpecRevision extends Omit<SpecRevision, 'body' | 'fit'> {
  body: DeskSpecBody;
  fit: FitRecord | null;
  createdAt?: string;
}

export interface DeskSpec {
  id: string;
  partNumber: string;
  name: string;
  description: string;
  currentRevisionId: string | null;
  currentRevision: DeskSpecRevision | null;
}

export interface DeskSpecDetail extends DeskSpec {
  revisions: DeskSpecRevision[];
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

export interface LotReport {
  lot: Lot;
  spec: { id: string; partNumber: string; name: string };
  revision: DeskSpecRevision;
  press: Press;
  inspections: Inspection[];
  defects: Defect[];
  dispositions: Disposition[];
  generatedAt: string;
}
