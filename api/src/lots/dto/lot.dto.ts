import { Transform, Type } from 'class-transformer';
import {
  IsBoolean,
  IsIn,
  IsInt,
  IsISO8601,
  IsOptional,
  IsString,
  IsUUID,
  Length,
  Max,
  Min,
} from 'class-validator';
import { DISPOSITION_ACTIONS, type DispositionAction } from '../entities/disposition.entity.js';

export class LotQueryDto {
  @IsOptional()
  @IsIn(['open', 'submitted'])
  status?: 'open' | 'submitted';

  /** `true`: the review queue — flagged and without a disposition. */
  @IsOptional()
  @Transform(({ value }: { value: unknown }) =>
    value === 'true' ? true : value === 'false' ? false : value,
  )
  @IsBoolean()
  flagged?: boolean;

  @IsOptional()
  @IsUUID()
  pressId?: string;

  @IsOptional()
  @IsUUID()
  specId?: string;

  @IsOptional()
  @IsISO8601({ strict: true })
  from?: string;

  @IsOptional()
  @IsISO8601({ strict: true })
  to?: string;

  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(1000)
  limit?: number;
}

export class DispositionDto {
  @IsIn(DISPOSITION_ACTIONS)
  action: DispositionAction;

  @IsString()
  @Length(1, 2000)
  note: string;
}

export class ReopenDto {
  @IsString()
  @Length(1, 2000)
  note: string;
}
