import { applyDecorators } from '@nestjs/common';
import { IsInt, IsNumber, Max, Min } from 'class-validator';

/**
 * A finite number (no NaN, no Infinity, no numeric string) within a physical range, both ends
 * included; `each` applies it to every item of an array.
 */
export const Finite = (min: number, max: number, each = false) =>
  applyDecorators(
    IsNumber({ allowNaN: false, allowInfinity: false }, { each }),
    Min(min, { each }),
    Max(max, { each }),
  );

export const WholeNumber = (min: number, max: number) =>
  applyDecorators(IsInt(), Min(min), Max(max));
