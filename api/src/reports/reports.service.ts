import { Injectable, NotFoundException } from '@nestjs/common';
import { DataSource, In } from 'typeorm';
import { Compound } from '../compounds/entities/compound.entity.js';
import type { CharacteristicVerdict, VerdictStatus } from '../engine.js';
import type { Measurements } from '../inspections/dto/measurements.dto.js';
import { Disposition } from '../lots/entities/disposition.entity.js';
import { Lot } from '../lots/entities/lot.entity.js';
import { LotsService } from '../lots/lots.service.js';
import { Press } from '../presses/entities/press.entity.js';
import type { SpecDerived } from '../specs/engine-spec.js';
import { Spec } from '../specs/entities/spec.entity.js';
import { SpecsService } from '../specs/specs.service.js';
import { User } from '../users/entities/user.entity.js';

/** DESIGN §7: where a part carries load, say what the numbers are and what they are not. */
export const REPORT_NOTICE =
  'Expected loads and acceptance windows are engineering estimates from the compound’s fitted ' +
  'model and the part’s shape factor. Acceptance follows the customer’s drawing and the ' +
  'applicable standards; safety-critical parts need the sign-off of a qualified engineer.';

export interface ReportPart {
  sampleIndex: number;
  recordId: string;
  supersedes: string | null;
  measurements: Measurements;
  status: VerdictStatus;
  conforming: boolean;
  characteristics: CharacteristicVerdict[];
  defects: {
    type: string;
    location: string;
    severity: string;
    note: string;
    photoSha256: string | null;
  }[];
  recordedBy: string;
  recordedAt: string;
}

export interface LotReport {
  generatedAt: string;
  notice: string;
  lot: Pick<
    Lot,
    'id' | 'lotNumber' | 'cavity' | 'lotSize' | 'moldedAt' | 'openedAt' | 'status' | 'submittedAt'
  >;
  part: { partNumber: string; name: string; revision: number; releasedAt: Date | null };
  compound: { code: string; name: string; model: string | null };
  press: { code: string; name: string };
  plan: Lot['plan'];
  verdict: { lot: Lot['serverVerdict']; reason: string; inspected: number; nonconforming: number };
  expected: Pick<SpecDerived, 'lowerLoad' | 'upperLoad' | 'windows'> | null;
  parts: ReportPart[];
  dispositions: { action: string; note: string; decidedBy: string; decidedAt: string }[];
}

const CSV_COLUMNS = [
  'lot',
  'part',
  'revision',
  'sample',
  'record',
  'supersedes',
  'thickness_mm',
  'dimensions_mm',
  'hardness_median_shore_a',
  'hardness_readings',
  'load_n',
  'compression_set_pct',
  'status',
  'conforming',
  'defects',
  'reasons',
  'recorded_by',
  'recorded_at',
];

/** RFC 4180 field: quoted when it holds a comma, quote or line break; a leading = + - @ is defused. */
function csvField(value: unknown): string {
  const text = value === null || value === undefined ? '' : String(value);
  const safe = /^[=+\-@]/.test(text) && Number.isNaN(Number(text)) ? `'${text}` : text;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

@Injectable()
export class ReportsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly lots: LotsService,
    private readonly specs: SpecsService,
  ) {}

  async report(lotId: string): Promise<LotReport> {
    const manager = this.dataSource.manager;
    const lot = await manager.findOneBy(Lot, { id: lotId });
    if (!lot) throw new NotFoundException(`No lot ${lotId}`);
    const { revision } = await this.specs.judged(manager, lot.specRevisionId);
    const [spec, press, compound, parts, dispositions] = await Promise.all([
      manager.findOneByOrFail(Spec, { id: lot.specId }),
      manager.findOneByOrFail(Press, { id: lot.pressId }),
      manager.findOneByOrFail(Compound, { id: revision.compoundId }),
      this.lots.judgeParts(manager, lot),
      manager.find(Disposition, { where: { lotId }, order: { decidedAt: 'ASC' } }),
    ]);
    const people = new Map(
      (
        await manager.findBy(User, {
          id: In([
            ...parts.map((p) => p.inspection.authorId),
            ...dispositions.map((d) => d.decidedBy),
          ]),
        })
      ).map((u) => [u.id, u.name]),
    );
    return {
      generatedAt: new Date().toISOString(),
      notice: REPORT_NOTICE,
      lot: {
        id: lot.id,
        lotNumber: lot.lotNumber,
        cavity: lot.cavity,
        lotSize: lot.lotSize,
        moldedAt: lot.moldedAt,
        openedAt: lot.openedAt,
        status: lot.status,
        submittedAt: lot.submittedAt,
      },
      part: {
        partNumber: spec.partNumber,
        name: spec.name,
        revision: revision.revision,
        releasedAt: revision.releasedAt,
      },
      compound: {
        code: compound.code,
        name: compound.name,
        model: revision.partSpec?.model.kind ?? null,
      },
      press: { code: press.code, name: press.name },
      plan: lot.plan,
      verdict: {
        lot: lot.serverVerdict,
        reason: lot.verdictReason,
        inspected: lot.inspected,
        nonconforming: lot.nonconforming,
      },
      expected: revision.derived
        ? {
            lowerLoad: revision.derived.lowerLoad,
            upperLoad: revision.derived.upperLoad,
            windows: revision.derived.windows,
          }
        : null,
      parts: parts.map(({ inspection, defects, verdict }) => ({
        sampleIndex: inspection.sampleIndex,
        recordId: inspection.id,
        supersedes: inspection.supersedesId,
        measurements: inspection.measurements,
        status: verdict.status,
        conforming: verdict.conforming,
        characteristics: verdict.characteristics,
        defects: defects.map(({ type, location, severity, note, photoSha256 }) => ({
          type,
          location,
          severity,
          note,
          photoSha256,
        })),
        recordedBy: people.get(inspection.authorId) ?? inspection.authorId,
        recordedAt: inspection.recordedAt.toISOString(),
      })),
      dispositions: dispositions.map((d) => ({
        action: d.action,
        note: d.note,
        decidedBy: people.get(d.decidedBy) ?? d.decidedBy,
        decidedAt: d.decidedAt.toISOString(),
      })),
    };
  }

  /** One row per sampled part, for a spreadsheet or the customer's own system. */
  async csv(lotId: string): Promise<{ fileName: string; text: string }> {
    const report = await this.report(lotId);
    const rows = report.parts.map((p) => {
      const m = p.measurements;
      const hardness = p.characteristics.find((c) => c.characteristic === 'hardness');
      return [
        report.lot.lotNumber,
        report.part.partNumber,
        report.part.revision,
        p.sampleIndex,
        p.recordId,
        p.supersedes,
        m.thickness,
        Object.entries(m.dimensions ?? {})
          .map(([name, value]) => `${name} ${value}`)
          .join('; '),
        hardness?.measured,
        (m.hardness ?? []).join(' '),
        m.load,
        m.compressionSetPercent,
        p.status,
        p.conforming ? 'yes' : 'no',
        p.defects.map((d) => `${d.severity} ${d.type} (${d.location})`).join('; '),
        p.characteristics
          .filter((c) => c.status !== 'within')
          .map((c) => c.reason)
          .join('; '),
        p.recordedBy,
        p.recordedAt,
      ]
        .map(csvField)
        .join(',');
    });
    return {
      fileName: `lot-${report.lot.lotNumber.replace(/[^A-Za-z0-9._-]/g, '_')}.csv`,
      text: [CSV_COLUMNS.join(','), ...rows].join('\r\n') + '\r\n',
    };
  }
}
