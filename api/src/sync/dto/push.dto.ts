import { z } from 'zod';
import { record, timestamp, uuid } from '../../common/schemas.js';
import {
  defectRecordPayload,
  inspectionRecordPayload,
  lotOpenPayload,
  lotSubmitPayload,
} from './operations.dto.js';

export const PAYLOADS = {
  'lot.open': lotOpenPayload,
  'inspection.record': inspectionRecordPayload,
  'defect.record': defectRecordPayload,
  'lot.submit': lotSubmitPayload,
};
export type OperationType = keyof typeof PAYLOADS;

/**
 * The envelope of a push. An operation's `type` and `payload` are checked one operation at a
 * time (PushPipe), so that a bad one is rejected alone rather than failing the batch.
 */
export const pushSchema = record({
  deviceId: uuid(),
  operations: z
    .array(
      record({
        opId: uuid(),
        type: z.unknown().optional(),
        authorId: uuid(),
        recordedAt: timestamp(),
        payload: z.unknown().optional(),
      }),
      { error: 'must be a list of operations' },
    )
    .max(500, { error: 'may hold up to 500 operations' }),
});

export interface OperationDto {
  opId: string;
  type: OperationType;
  authorId: string;
  recordedAt: string;
  payload: object;
}

/**
 * What the push route receives once PushPipe has validated it: `problems[i]` says why operation
 * i cannot be applied, if it cannot; the rest of the batch goes on.
 */
export interface PushRequest {
  deviceId: string;
  operations: OperationDto[];
  problems: (string | undefined)[];
}
