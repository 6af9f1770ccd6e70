import {
  IsBoolean,
  IsIn,
  IsNumber,
  IsOptional,
  IsString,
  Length,
  Matches,
  Max,
  Min,
} from 'class-validator';
import { PRESS_KINDS, type PressKind } from '../entities/press.entity.js';

const finite = { allowNaN: false, allowInfinity: false } as const;

export class CreatePressDto {
  @IsString()
  @Length(1, 32)
  @Matches(/^[A-Za-z0-9._-]+$/, {
    message: 'code may hold letters, digits, dot, dash and underscore',
  })
  code: string;

  @IsString()
  @Length(1, 120)
  name: string;

  @IsIn(PRESS_KINDS)
  kind: PressKind;

  /** Rubber presses run from bench-top (tens of kN) to very large (tens of MN). */
  @IsOptional()
  @IsNumber(finite)
  @Min(1)
  @Max(100_000)
  clampForceKn?: number;
}

export class UpdatePressDto {
  @IsOptional()
  @IsString()
  @Length(1, 120)
  name?: string;

  @IsOptional()
  @IsIn(PRESS_KINDS)
  kind?: PressKind;

  @IsOptional()
  @IsNumber(finite)
  @Min(1)
  @Max(100_000)
  clampForceKn?: number;

  @IsOptional()
  @IsBoolean()
  active?: boolean;
}
