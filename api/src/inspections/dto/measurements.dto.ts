import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, ValidateNested, IsObject } from 'class-validator';
import { Finite } from '../../common/numbers.js';
import { Optional } from '../../common/optional.js';

/** Plan dimensions as measured, named as in the spec's geometry (mm). */
export class DimensionsDto {
  @Optional()
  @Finite(0.1, 3000)
  diameter?: number;

  @Optional()
  @Finite(0.1, 3000)
  outerDiameter?: number;

  @Optional()
  @Finite(0.1, 3000)
  innerDiameter?: number;

  @Optional()
  @Finite(0.1, 3000)
  side?: number;

  @Optional()
  @Finite(0.1, 3000)
  length?: number;

  @Optional()
  @Finite(0.1, 3000)
  width?: number;
}

/** One sampled part's readings; each is optional because a plan may not call for all of them. */
export class Measurements {
  @Optional()
  @Finite(0.05, 500)
  thickness?: number;

  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => DimensionsDto)
  dimensions?: DimensionsDto;

  /** Shore A durometer readings: 3 or 5 are usual, the median counts. */
  @Optional()
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(5)
  @Finite(0, 100, true)
  hardness?: number[];

  /** N, read at the spec's test deflection. */
  @Optional()
  @Finite(0, 10_000_000)
  load?: number;

  /** From a compression-set test piece of the lot (ASTM D395 B / ISO 815-1), percent. */
  @Optional()
  @Finite(0, 100)
  compressionSetPercent?: number;
}
