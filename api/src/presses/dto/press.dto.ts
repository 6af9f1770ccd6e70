import { IsBoolean, IsIn, IsNumber, IsString, Length, Matches, Max, Min } from 'class-validator';
import { PRESS_KINDS, type PressKind } from '../entities/press.entity.js';
import { Optional } from '../../common/optional.js';

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
  @Optional()
  @IsNumber(finite)
  @Min(1)
  @Max(100_000)
  clampForceKn?: number;
}

export class UpdatePressDto {
  @Optional()
  @IsString()
  @Length(1, 120)
  name?: string;

  @Optional()
  @IsIn(PRESS_KINDS)
  kind?: PressKind;

  @Optional()
  @IsNumber(finite)
  @Min(1)
  @Max(100_000)
  clampForceKn?: number;

  @Optional()
  @IsBoolean()
  active?: boolean;
}
