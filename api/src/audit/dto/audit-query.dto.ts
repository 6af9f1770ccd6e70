import { Type } from 'class-transformer';
import { IsInt, IsString, Max, MaxLength, Min } from 'class-validator';
import { Optional } from '../../common/optional.js';

export class AuditQueryDto {
  @Optional()
  @IsString()
  @MaxLength(40)
  entity?: string;

  @Optional()
  @IsString()
  @MaxLength(64)
  entityId?: string;

  /** Page backwards: entries with an id below this one. */
  @Optional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(2_147_483_647) // a SQL integer (32-bit on PostgreSQL)
  before?: number;

  @Optional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(1000)
  limit?: number;
}
