import { Type } from 'class-transformer';
import {
  IsBoolean,
  IsIn,
  IsObject,
  IsString,
  IsUUID,
  Length,
  ValidateNested,
} from 'class-validator';
import { Finite, FiniteAbove } from '../../common/numbers.js';
import { PREFERRED_AQLS } from '../../engine.js';
import { GEOMETRY_TYPES, GeometryDto, type Geometry } from './geometry.dto.js';
import { Optional } from '../../common/optional.js';

export const TOLERANCE_CLASSES = ['M1', 'M2', 'M3', 'M4'] as const;
export const LEVELS = ['I', 'II', 'III'] as const;
export const SEVERITIES = ['normal', 'tightened', 'reduced'] as const;

type ToleranceClass = (typeof TOLERANCE_CLASSES)[number];

export class DimensionClassDto {
  @IsIn(TOLERANCE_CLASSES)
  class: ToleranceClass;

  /** ISO 3302-1: 'closure' dimensions cross the parting line and carry flash. */
  @IsIn(['fixed', 'closure'])
  kind: 'fixed' | 'closure';
}

/** Per-dimension classes where the drawing differs from the spec's general class. */
export class DimensionClassesDto {
  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => DimensionClassDto)
  thickness?: DimensionClassDto;

  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => DimensionClassDto)
  diameter?: DimensionClassDto;

  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => DimensionClassDto)
  outerDiameter?: DimensionClassDto;

  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => DimensionClassDto)
  innerDiameter?: DimensionClassDto;

  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => DimensionClassDto)
  side?: DimensionClassDto;

  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => DimensionClassDto)
  length?: DimensionClassDto;

  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => DimensionClassDto)
  width?: DimensionClassDto;
}

export class ToleranceDto {
  /** The general class; a dimension not listed in `dimensions` takes it as a fixed dimension. */
  @IsIn(TOLERANCE_CLASSES)
  class: ToleranceClass;

  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => DimensionClassesDto)
  dimensions?: DimensionClassesDto;
}

export class MechanicsDto {
  @Optional()
  @IsIn(['none', 'gent-lindley', 'lubrication'])
  bulkCorrection?: 'none' | 'gent-lindley' | 'lubrication';

  /** Lindley's material factor k; read from the hardness defaults when absent. */
  @Optional()
  @Finite(0, 2)
  materialFactor?: number;
}

export class HardnessSpecDto {
  /** Shore A; readings under about 20 or over 90 are unreliable (REFERENCES §6). */
  @Finite(20, 90)
  nominal: number;

  /** ± points; ±5 is the usual call-out. */
  @Finite(1, 15)
  tolerance: number;
}

/** The test condition the compression-set limit is stated at, e.g. 70 °C for 22 h. */
export class CompressionSetConditionDto {
  @Finite(-100, 400)
  temperatureC: number;

  @FiniteAbove(0, 100_000)
  hours: number;
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
  @IsObject()
  @ValidateNested()
  @Type(() => GeometryDto, GEOMETRY_TYPES)
  geometry: Geometry;

  @IsBoolean()
  bonded: boolean;

  /** Unbonded parts: 'friction' gives lubricated and bonded loads as bounds. */
  @Optional()
  @IsIn(['friction', 'lubricated'])
  unbondedFaces?: 'friction' | 'lubricated';

  @IsUUID()
  compoundId: string;

  /** mm; checked against the thickness when the revision is saved. */
  @Finite(0.01, 200)
  testDeflection: number;

  /** ± % of the expected load at the test deflection. */
  @Finite(0.5, 50)
  loadTolerancePercent: number;

  @IsObject()
  @ValidateNested()
  @Type(() => ToleranceDto)
  tolerance: ToleranceDto;

  @IsObject()
  @ValidateNested()
  @Type(() => HardnessSpecDto)
  hardness: HardnessSpecDto;

  @Optional()
  @Finite(1, 100)
  compressionSetLimitPercent?: number;

  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => CompressionSetConditionDto)
  compressionSetCondition?: CompressionSetConditionDto;

  @IsObject()
  @ValidateNested()
  @Type(() => SamplingDto)
  sampling: SamplingDto;

  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => MechanicsDto)
  mechanics?: MechanicsDto;

  /** What changed in this revision. */
  @Optional()
  @IsString()
  @Length(0, 1000)
  note?: string;
}
