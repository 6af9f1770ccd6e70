import { Type } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsUUID, ValidateNested } from 'class-validator';
import { Finite } from '../../common/numbers.js';
import { PREFERRED_AQLS } from '../../engine.js';
import { GEOMETRY_TYPES, GeometryDto, type Geometry } from './geometry.dto.js';

export const TOLERANCE_CLASSES = ['M1', 'M2', 'M3', 'M4'] as const;
export const LEVELS = ['I', 'II', 'III'] as const;
export const SEVERITIES = ['normal', 'tightened', 'reduced'] as const;

export class ToleranceDto {
  @IsIn(TOLERANCE_CLASSES)
  class: (typeof TOLERANCE_CLASSES)[number];
}

export class HardnessSpecDto {
  /** Shore A; readings under about 20 or over 90 are unreliable (REFERENCES §6). */
  @Finite(20, 90)
  nominal: number;

  /** ± points; ±5 is the usual call-out. */
  @Finite(1, 15)
  tolerance: number;
}

export class SamplingDto {
  @IsIn(LEVELS)
  level: (typeof LEVELS)[number];

  /** ISO 2859-1 preferred AQLs for percent nonconforming (REFERENCES §9). */
  @IsIn(PREFERRED_AQLS)
  aql: number;

  @IsIn(SEVERITIES)
  severity: (typeof SEVERITIES)[number];
}

export class SpecBody {
  @ValidateNested()
  @Type(() => GeometryDto, GEOMETRY_TYPES)
  geometry: Geometry;

  @IsBoolean()
  bonded: boolean;

  @IsUUID()
  compoundId: string;

  /** mm; checked against the thickness when the revision is saved. */
  @Finite(0.01, 200)
  testDeflection: number;

  /** ± % of the expected load at the test deflection. */
  @Finite(0.5, 50)
  loadTolerancePercent: number;

  @ValidateNested()
  @Type(() => ToleranceDto)
  tolerance: ToleranceDto;

  @ValidateNested()
  @Type(() => HardnessSpecDto)
  hardness: HardnessSpecDto;

  @IsOptional()
  @Finite(1, 100)
  compressionSetLimitPercent?: number;

  @ValidateNested()
  @Type(() => SamplingDto)
  sampling: SamplingDto;
}
