import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsString,
  Length,
  ValidateNested,
} from 'class-validator';
import { Finite, FiniteAbove } from '../../common/numbers.js';

export class AgingPointDto {
  /** Oven temperature, °C. */
  @Finite(-100, 400)
  temperatureC: number;

  /** Hours until the set reached the threshold. */
  @FiniteAbove(0, 1_000_000)
  hours: number;
}

export class CreateAgingSetDto {
  @IsString()
  @Length(1, 120)
  name: string;

  /** The compression set, %, that ends the part's life. */
  @FiniteAbove(0, 100, true)
  thresholdPercent: number;

  /** Three distinct temperatures at least: the engine's Arrhenius fit checks that. */
  @IsArray()
  @ArrayMinSize(3)
  @ArrayMaxSize(200)
  @ValidateNested({ each: true })
  @Type(() => AgingPointDto)
  points: AgingPointDto[];
}
