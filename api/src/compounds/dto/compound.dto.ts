import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  ArrayUnique,
  IsArray,
  IsIn,
  IsString,
  IsUUID,
  Length,
  Matches,
  ValidateNested,
  IsObject,
} from 'class-validator';
import { Finite, FiniteAbove } from '../../common/numbers.js';
import { MODES, type Mode } from '../../engine.js';
import { POLYMERS, type Polymer } from '../entities/compound.entity.js';
import { MODEL_TYPES, ModelDto, type ModelBody } from './model.dto.js';
import { Optional } from '../../common/optional.js';

export class CreateCompoundDto {
  @IsString()
  @Length(1, 32)
  @Matches(/^[A-Za-z0-9._-]+$/, {
    message: 'code may hold letters, digits, dot, dash and underscore',
  })
  code: string;

  @IsString()
  @Length(1, 120)
  name: string;

  @IsIn(POLYMERS)
  polymer: Polymer;

  @Finite(10, 95)
  hardnessShoreA: number;

  /** Rubbers lie around 1000–3000 MPa. */
  @Optional()
  @Finite(100, 10_000)
  bulkModulusMPa?: number;

  @Optional()
  @IsString()
  @Length(0, 2000)
  notes?: string;
}

/** Everything but the code, which identifies the compound on drawings and labels. */
export class UpdateCompoundDto {
  @Optional()
  @IsString()
  @Length(1, 120)
  name?: string;

  @Optional()
  @IsIn(POLYMERS)
  polymer?: Polymer;

  @Optional()
  @Finite(10, 95)
  hardnessShoreA?: number;

  @Optional()
  @Finite(100, 10_000)
  bulkModulusMPa?: number;

  @Optional()
  @IsString()
  @Length(0, 2000)
  notes?: string;
}

export class StressPointDto {
  /** Stretch λ: compression tests go below 1, tensile ones to about 8 for natural rubber. */
  @Finite(0.05, 20)
  stretch: number;

  /** Nominal stress, MPa. */
  @Finite(-500, 500)
  stress: number;
}

export class CreateTestSetDto {
  @IsString()
  @Length(1, 120)
  name: string;

  @IsIn(MODES)
  mode: Mode;

  @Optional()
  @Finite(-80, 300)
  temperatureC?: number;

  @IsArray()
  @ArrayMinSize(2)
  @ArrayMaxSize(5000)
  @ValidateNested({ each: true })
  @Type(() => StressPointDto)
  points: StressPointDto[];
}

/** Weight of each mode's squared residuals in the fit; modes left out weigh 1. */
export class FitWeightsDto {
  @Optional()
  @FiniteAbove(0, 1000)
  uniaxial?: number;

  @Optional()
  @FiniteAbove(0, 1000)
  equibiaxial?: number;

  @Optional()
  @FiniteAbove(0, 1000)
  planar?: number;
}

export class CreateFitDto {
  /** The starting point; the fit comes back in the same shape. */
  @IsObject()
  @ValidateNested()
  @Type(() => ModelDto, MODEL_TYPES)
  model: ModelBody;

  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(50)
  @ArrayUnique()
  @IsUUID(undefined, { each: true })
  testSetIds: string[];

  @IsIn(['absolute', 'relative'])
  objective: 'absolute' | 'relative';

  @Optional()
  @IsObject()
  @ValidateNested()
  @Type(() => FitWeightsDto)
  weights?: FitWeightsDto;
}

export class PublishFitDto {
  /** What the new constants are for; optional so that scripted publishing keeps working. */
  @Optional()
  @IsString()
  @Length(1, 1000)
  note?: string;
}
