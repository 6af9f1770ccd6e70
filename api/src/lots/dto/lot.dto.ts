import { Transform, Type } from 'class-transformer';
import {
  IsBoolean,
  IsIn,
  IsInt,
  IsISO8601,
  IsString,
  IsUUID,
  Length,
  Max,
  Min,
} from 'class-validator';
import { DISPOSITION_ACTIONS, type DispositionAction } from '../entities/disposition.entity.js';
import { Optional } from '../../common/optional.js';

export class LotQueryDto {
  @Optional()
  @IsIn(['open', 'submitted'])
  status?: 'open' | 'submitted';

  /** `true`: the review queue — flagged and without a disposition; `false`: lots not flagged. */
  @Optional()
  @Transform(({ value }: { value: unknown }) =>
    value === 'true' ? true : value === 'false' ? false : value,
  )
  @IsBoolean()
  flagged?: boolean;

  @Optional()
  @IsUUID()
  pressId?: string;

  @Optional()
  @IsUUID()
  specId?: string;

  @Optional()
  @IsISO8601({ strict: true })
  from?: string;

  @Optional()
  @IsISO8601({ strict: true })
  to?: string;

  @Optional()
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
