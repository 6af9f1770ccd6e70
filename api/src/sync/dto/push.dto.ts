import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsISO8601,
  IsObject,
  IsString,
  IsUUID,
  Length,
  ValidateNested,
} from 'class-validator';

export class OperationDto {
  @IsUUID()
  opId: string;

  /** Checked per operation, so an op of a type this server does not know is rejected alone. */
  @IsString()
  @Length(1, 24)
  type: string;

  @IsUUID()
  authorId: string;

  @IsISO8601({ strict: true })
  recordedAt: string;

  /** Validated per operation type (sync/README.md); a bad payload rejects that op only. */
  @IsObject()
  payload: Record<string, unknown>;
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
