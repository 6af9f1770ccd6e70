import { Type } from 'class-transformer';
import { IsInt, Max, Min } from 'class-validator';
import { Optional } from '../../common/optional.js';

export class PullQueryDto {
  /** The cursor from the previous pull; 0 or absent for everything. */
  @Optional()
  @Type(() => Number)
  @IsInt()
  @Min(0)
  @Max(2_147_483_647) // a SQL integer (32-bit on PostgreSQL)
  since?: number;

  @Optional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(1000)
  limit?: number;
}
