import { applyDecorators } from '@nestjs/common';
import { IsInt, Max, Min, ValidateBy, buildMessage } from 'class-validator';

/**
 * A finite number (no NaN, no Infinity, no numeric string) within a physical range, both ends
 * included; `each` applies it to every item of an array. One check rather than three, so one
 * message says all of it.
 */
export const Finite = (min: number, max: number, each = false) =>
  ValidateBy(
    {
      name: 'finiteInRange',
      constraints: [min, max],
      validator: {
        validate: (value: unknown) =>
          typeof value === 'number' && Number.isFinite(value) && value >= min && value <= max,
        defaultMessage: buildMessage(
          (prefix) => `${prefix}$property must be a finite number from ${min} to ${max}`,
        ),
      },
    },
    { each },
  );

export const WholeNumber = (min: number, max: number) =>
  applyDecorators(IsInt(), Min(min), Max(max));

/** Like Finite, but the lower end is excluded (and the upper too when `openMax`). */
export const FiniteAbove = (min: number, max: number, openMax = false) =>
  ValidateBy({
    name: 'finiteAbove',
    constraints: [min, max],
    validator: {
      validate: (value: unknown) =>
        typeof value === 'number' &&
        Number.isFinite(value) &&
        value > min &&
        (openMax ? value < max : value <= max),
      defaultMessage: buildMessage(
        (prefix) =>
          `${prefix}$property must be a finite number above ${min} and ${openMax ? 'below' : 'up to'} ${max}`,
      ),
    },
  });
