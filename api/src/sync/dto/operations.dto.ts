import { z } from 'zod';
import { finite, oneOf, record, timestamp, uuid, whole } from '../../common/schemas.js';
import {
  DEFECT_LOCATIONS,
  DEFECT_SEVERITIES,
  DEFECT_TYPES,
} from '../../inspections/entities/defect.entity.js';
import { measurementsSchema } from '../../inspections/dto/measurements.dto.js';

/* The payload of each operation type (sync/README.md "Operation types"). */

export const lotOpenPayload = record({
  id: uuid(),
  lotNumber: z
    .string({ error: 'must be a text of 1 to 40 characters' })
    .min(1, { error: 'must be a text of 1 to 40 characters' })
    .max(40, { error: 'must be a text of 1 to 40 characters' })
    .regex(/^[A-Za-z0-9._/-]+$/, {
      error: 'may hold letters, digits, dot, dash, slash and underscore',
    }),
  specRevisionId: uuid(),
  pressId: uuid(),
  cavity: whole(1, 999),
  lotSize: whole(1, 1_000_000),
  moldedAt: timestamp(),
});
export type LotOpenPayload = z.infer<typeof lotOpenPayload>;

const STATUSES = ['within', 'near', 'out'] as const;

/**
 * What the tablet showed for the part: the overall and per-characteristic status of the
 * engine's PartVerdict (its words and numbers follow from the measurements, so they stay home).
 */
export const deviceVerdictSchema = record({
  status: oneOf(STATUSES),
  conforming: z.boolean({ error: 'must be true or false' }),
  /** `{ load: 'within', thickness: 'near', … }`: one status per characteristic, up to 20. */
  characteristics: z
    .record(
      z.string().regex(/^[a-z][a-zA-Z-]{0,39}$/, { error: 'is not a characteristic name' }),
      oneOf(STATUSES),
      { error: 'must map characteristic names to within, near or out' },
    )
    .refine((map) => Object.keys(map).length <= 20, { error: 'may name up to 20 characteristics' })
    .optional(),
});
export type DeviceVerdictDto = z.infer<typeof deviceVerdictSchema>;

export const inspectionRecordPayload = record({
  id: uuid(),
  lotId: uuid(),
  sampleIndex: whole(1, 2000),
  supersedes: uuid().optional(),
  measurements: measurementsSchema,
  deviceVerdict: deviceVerdictSchema,
});
export type InspectionRecordPayload = z.infer<typeof inspectionRecordPayload>;

export const defectRecordPayload = record({
  id: uuid(),
  lotId: uuid(),
  inspectionId: uuid().optional(),
  type: oneOf(DEFECT_TYPES),
  location: oneOf(DEFECT_LOCATIONS),
  severity: oneOf(DEFECT_SEVERITIES),
  sizeMm: finite(0.01, 3000).optional(),
  note: z
    .string({ error: 'must be a text of up to 1000 characters' })
    .max(1000, { error: 'must be a text of up to 1000 characters' })
    .optional(),
  photoSha256: z
    .string({ error: 'must be 64 lowercase hex digits' })
    .regex(/^[0-9a-f]{64}$/, { error: 'must be 64 lowercase hex digits' })
    .optional(),
});
export type DefectRecordPayload = z.infer<typeof defectRecordPayload>;

export const lotSubmitPayload = record({
  lotId: uuid(),
  deviceVerdict: record({
    verdict: oneOf(['pass', 'flagged']),
    nonconforming: whole(0, 2000),
  }),
});
export type LotSubmitPayload = z.infer<typeof lotSubmitPayload>;
