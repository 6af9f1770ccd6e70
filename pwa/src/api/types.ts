/**
 * Shapes the plant server sends and accepts, as listed in api/src/ROUTES.md and
 * api/src/sync/README.md. Lengths mm, forces N, hardness Shore A.
 */
import type {
  CharacteristicVerdict,
  MaterialModel,
  PartSpec,
  VerdictStatus,
} from '../engine/index';

export type Role = 'inspector' | 'supervisor' | 'quality' | 'admin';

export interface User {
  id: string;
  name: string;
  email: string;
  role: Role;
  active: boolean;
}

export type PressKind = 'compression' | 'transfer' | 'injection';

export interface Press {
  id: string;
  code: string;
  name: string;
  kind: PressKind;
  clampForceKn: number | null;
  active: boolean;
}

export interface Fit {
  id: string;
  compoundId: string;
  version: number;
  model: MaterialModel;
  objective: 'absolute' | 'relative';
  status: 'draft' | 'published';
  publishedAt: string | null;
}

export interface Compound {
  id: string;
  code: string;
  name: string;
  polymer: string;
  hardnessShoreA: number;
  currentFitId: string | null;
}

export type Geometry =
  | { shape: 'disc'; diameter: number; thickness: number }
  | { shape: 'annulus'; outerDiameter: number; innerDiameter: number; thickness: number }
  | { shape: 'square'; side: number; thickness: number }
  | { shape: 'rectangle'; length: number; width: number; thickness: number }
  | { shape: 'strip'; width: number; thickness: number };

export type ToleranceClass = 'M1' | 'M2' | 'M3' | 'M4';
export type InspectionLevel = 'I' | 'II' | 'III';
export type Severity = 'normal' | 'tightened' | 'reduced';

export interface SpecBody {
  geometry: Geometry;
  bonded: boolean;
  compoundId: string;
  testDeflection: number;
  loadTolerancePercent: number;
  tolerance: { class: ToleranceClass };
  hardness: { nominal: number; tolerance: number };
  compressionSetLimitPercent?: number;
  sampling: { level: InspectionLevel; aql: number; severity: Severity };
}

export interface SpecRevision {
  id: string;
  specId: string;
  revision: number;
  status: 'draft' | 'released';
  body: SpecBody;
  fit: Fit | null;
  /** Frozen at release: the spec with the fit's constants, exactly as the server judges parts. */
  partSpec?: PartSpec | null;
  derived: Record<string, unknown> | null;
  releasedAt: string | null;
  releasedBy: string | null;
}

/** A released revision as pull delivers it, with its part's number and name. */
export interface PulledSpec extends SpecRevision {
  partNumber: string;
  name: string;
}

export interface LotPlan {
  codeLetter: string;
  sampleSize: number;
  accept: number;
  reject: number;
  /** The row whose plan applies after the table's arrows (the server sends it). */
  planLetter?: string;
}

export type LotVerdict = 'pass' | 'flagged';

export type DispositionAction = 'release' | 'hold' | 'sort-all' | 'rework' | 'scrap';

export interface Lot {
  id: string;
  lotNumber: string;
  specId: string;
  specRevisionId: string;
  pressId: string;
  cavity: number;
  lotSize: number;
  moldedAt: string;
  openedBy: string;
  openedAt: string;
  status: 'open' | 'submitted';
  plan: LotPlan;
  nonconforming: number;
  serverVerdict: 'pending' | LotVerdict;
  deviceVerdict: { verdict: LotVerdict; nonconforming: number } | null;
  flaggedAt: string | null;
  dispositionAction: DispositionAction | null;
}

export interface Measurements {
  thickness?: number;
  dimensions?: Partial<
    Record<'diameter' | 'outerDiameter' | 'innerDiameter' | 'side' | 'length' | 'width', number>
  >;
  hardness?: number[];
  load?: number;
}

export interface Inspection {
  id: string;
  lotId: string;
  sampleIndex: number;
  supersedes: string | null;
  supersededBy: string | null;
  measurements: Measurements;
  deviceVerdict: Record<string, unknown>;
  serverVerdict: Record<string, unknown>;
  conforming: boolean;
  authorId: string;
  deviceId: string;
  recordedAt: string;
  receivedAt: string;
}

export type DefectLocation = 'sealing' | 'flexing' | 'protecting' | 'cosmetic';
export type DefectSeverity = 'critical' | 'major' | 'minor';

export interface Defect {
  id: string;
  lotId: string;
  inspectionId: string | null;
  type: string;
  location: DefectLocation;
  severity: DefectSeverity;
  sizeMm: number | null;
  note: string | null;
  photoSha256: string | null;
  authorId: string;
  recordedAt: string;
}

export interface Disposition {
  id: string;
  lotId: string;
  action: DispositionAction;
  note: string;
  decidedBy: string;
  decidedAt: string;
}

export interface LotDetail extends Lot {
  inspections: Inspection[];
  defects: Defect[];
  dispositions: Disposition[];
}

/** GET /admin/mail/settings (api/src/ROUTES.md). */
export interface MailSettings {
  transport: 'local' | 'smtp';
  server: string;
  from: string;
  flaggedLotRecipients: string[];
  queue: { sent: number; waiting: number; failed: number };
}

export interface MailMessage {
  id: string;
  date: string;
  from: string;
  to: string;
  subject: string;
  text: string;
}

/** A tablet or browser as the server knows it: by the id given at sign-in and on pushes. */
export interface Device {
  deviceId: string;
  /** Who signed in on it, the latest first. */
  people: { userId: string; name: string; email: string }[];
  firstSeenAt: string;
  lastSignInAt: string;
  lastPushAt: string | null;
  appliedOps: number;
  activeSessions: number;
}

export interface DeviceRevoked {
  deviceId: string;
  revoked: number;
}

export type PulledKind = 'press' | 'compound' | 'fit' | 'spec' | 'lot' | 'disposition';

export interface PulledChange {
  seq: number;
  kind: PulledKind;
  id: string;
  data: unknown;
}

export interface PullAnswer {
  changes: PulledChange[];
  cursor: number | string;
  more: boolean;
}

export interface PushOperation {
  opId: string;
  type: string;
  authorId: string;
  recordedAt: string;
  payload: unknown;
}

export interface PushResult {
  opId: string;
  status: 'applied' | 'duplicate' | 'rejected';
  reason?: string;
}

/** GET /lots/:id/report: the lot as a customer's report shows it (api/src/reports). */
export interface LotReport {
  generatedAt: string;
  /** The server's words on what the estimates are and are not (DESIGN §7). */
  notice: string;
  lot: Pick<Lot, 'id' | 'lotNumber' | 'cavity' | 'lotSize' | 'moldedAt' | 'openedAt' | 'status'> & {
    submittedAt: string | null;
  };
  part: { partNumber: string; name: string; revision: number; releasedAt: string | null };
  compound: { code: string; name: string; model: string | null };
  press: { code: string; name: string };
  plan: LotPlan & SpecBody['sampling'];
  verdict: { lot: Lot['serverVerdict']; reason: string; inspected: number; nonconforming: number };
  expected: {
    lowerLoad: number;
    upperLoad: number;
    windows?: {
      thickness?: { min: { value: number | null }; max: { value: number | null } };
      hardness?: { min: { value: number | null }; max: { value: number | null } };
    };
  } | null;
  parts: ReportPart[];
  dispositions: { action: DispositionAction; note: string; decidedBy: string; decidedAt: string }[];
}

export interface ReportPart {
  sampleIndex: number;
  recordId: string;
  supersedes: string | null;
  measurements: Measurements;
  status: VerdictStatus;
  conforming: boolean;
  characteristics: CharacteristicVerdict[];
  defects: Pick<Defect, 'type' | 'location' | 'severity' | 'note' | 'photoSha256'>[];
  recordedBy: string;
  recordedAt: string;
}
