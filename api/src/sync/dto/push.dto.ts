import { Type, type TypeHelpOptions } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsISO8601,
  IsObject,
  IsUUID,
  ValidateNested,
} from 'class-validator';
import {
  DefectRecordPayload,
  InspectionRecordPayload,
  LotOpenPayload,
  LotSubmitPayload,
} from './operations.dto.js';

export const PAYLOADS = {
  'lot.open': LotOpenPayload,
  'inspection.record': InspectionRecordPayload,
  'defect.record': DefectRecordPayload,
  'lot.submit': LotSubmitPayload,
};
export type OperationType = keyof typeof PAYLOADS;

/** Stands in for the payload of an unknown type, which is then reported by its `type`. */
class UnknownPayload {}

export class OperationDto {
  @IsUUID()
  opId: string;

  @IsIn(Object.keys(PAYLOADS))
  type: OperationType;

  @IsUUID()
  authorId: string;

  @IsISO8601({ strict: true })
  recordedAt: string;

  // Each payload takes the class of its operation's type (sync/README.md).
  @IsObject()
  @ValidateNested()
  @Type((help?: TypeHelpOptions) => {
    const type = (help?.object as { type?: unknown } | undefined)?.type;
    return Object.hasOwn(PAYLOADS, String(type)) ? PAYLOADS[type as OperationType] : UnknownPayload;
  })
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

export class PushDto {
  @IsUUID()
  deviceId: string;

  @IsArray()
  @ArrayMaxSize(500)
  @ValidateNested({ each: true })
  @Type(() => OperationDto)
  operations: OperationDto[];
}
