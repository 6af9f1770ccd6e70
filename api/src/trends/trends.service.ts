import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { And, In, LessThan, MoreThanOrEqual, Repository, type FindOptionsWhere } from 'typeorm';
import { medianHardness } from '../engine.js';
import { Inspection } from '../inspections/entities/inspection.entity.js';
import { Lot } from '../lots/entities/lot.entity.js';
import { currentInspections } from '../lots/lots.service.js';
import { Press } from '../presses/entities/press.entity.js';
import type { MeasurementsQueryDto } from './dto/measurements-query.dto.js';

/** One current sampled part with its lot's press and cavity: a point of a trend chart. */
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
  /** The median of the readings, as verdicts use (REFERENCES §6). */
  hardness: number | null;
  load: number | null;
  conforming: boolean;
}

// As many lots as the lot list gives at most: a few months of one part at a busy press.
const MAX_LOTS = 1000;

/** The end of a `to` bound, excluded: a date without a time covers that whole day (UTC). */
function endOf(to: string): Date {
  const end = new Date(to);
  if (/^\d{4}-\d{2}-\d{2}$/.test(to)) end.setUTCDate(end.getUTCDate() + 1);
  else end.setTime(end.getTime() + 1);
  return end;
}

@Injectable()
export class TrendsService {
  constructor(
    @InjectRepository(Lot) private readonly lots: Repository<Lot>,
    @InjectRepository(Inspection) private readonly inspections: Repository<Inspection>,
    @InjectRepository(Press) private readonly presses: Repository<Press>,
  ) {}

  /** Every current (not superseded) sampled part of the matching lots, oldest lot first. */
  async measurements(query: MeasurementsQueryDto): Promise<MeasurementRow[]> {
    const where: FindOptionsWhere<Lot> = { specId: query.specId };
    if (query.pressId) where.pressId = query.pressId;
    if (query.cavity) where.cavity = query.cavity;
    const from = query.from ? new Date(query.from) : undefined;
    const to = query.to ? endOf(query.to) : undefined;
    if (from && to) where.moldedAt = And(MoreThanOrEqual(from), LessThan(to));
    else if (from) where.moldedAt = MoreThanOrEqual(from);
    else if (to) where.moldedAt = LessThan(to);
    const lots = (
      await this.lots.find({ where, order: { moldedAt: 'DESC' }, take: MAX_LOTS })
    ).reverse();
    if (lots.length === 0) return [];
    const [inspections, presses] = await Promise.all([
      this.inspections.find({
        select: {
          id: true,
          lotId: true,
          sampleIndex: true,
          supersedesId: true,
          measurements: true,
          conforming: true,
          recordedAt: true,
        },
        where: { lotId: In(lots.map((lot) => lot.id)) },
        order: { sampleIndex: 'ASC' },
      }),
      this.presses.find({ select: { id: true, code: true } }),
    ]);
    const pressCode = new Map(presses.map((p) => [p.id, p.code]));
    const byLot = new Map<string, Inspection[]>();
    for (const inspection of currentInspections(inspections)) {
      const ofLot = byLot.get(inspection.lotId);
      if (ofLot) ofLot.push(inspection);
      else byLot.set(inspection.lotId, [inspection]);
    }
    return lots.flatMap((lot) =>
      (byLot.get(lot.id) ?? []).map((inspection) => {
        const { thickness, hardness, load } = inspection.measurements;
        return {
          inspectionId: inspection.id,
          lotId: lot.id,
          lotNumber: lot.lotNumber,
          specRevisionId: lot.specRevisionId,
          pressId: lot.pressId,
          pressCode: pressCode.get(lot.pressId) ?? '?',
          cavity: lot.cavity,
          moldedAt: lot.moldedAt.toISOString(),
          sampleIndex: inspection.sampleIndex,
          recordedAt: inspection.recordedAt.toISOString(),
          thickness: thickness ?? null,
          hardness: hardness?.length ? medianHardness(hardness) : null,
          load: load ?? null,
          conforming: inspection.conforming,
        };
      }),
    );
  }
}
