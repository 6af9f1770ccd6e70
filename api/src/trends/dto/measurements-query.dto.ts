import { Type } from 'class-transformer';
import { IsISO8601, IsInt, IsUUID, Max, Min } from 'class-validator';
import { Optional } from '../../common/optional.js';

/** Which sampled parts a trend chart shows: one part spec's, optionally by press and cavity. */
export class MeasurementsQueryDto {
  @IsUUID()
  specId: string;

  @Optional()
  @IsUUID()
  pressId?: string;

  @Optional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(999)
  cavity?: number;

  /** Lots molded at or after this time. */
  @Optional()
  @IsISO8601({ strict: true })
  from?: string;

  /** Lots molded up to this time, or through this day when it is a date alone. */
  @Optional()
  @IsISO8601({ strict: true })
  to?: string;
}
