import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  Equals,
  IsArray,
  IsIn,
  IsString,
  Length,
  ValidateNested,
  registerDecorator,
  type ValidationOptions,
} from 'class-validator';
import { Finite } from '../../common/numbers.js';

export const MODEL_KINDS = [
  'neo-hookean',
  'mooney-rivlin',
  'yeoh',
  'ogden',
  'gent',
  'arruda-boyce',
  'formula',
] as const;

// Hyperelastic constants of rubbers are fractions of an MPa to a few MPa; the bound only keeps
// out nonsense. Some (Ogden μ, Mooney–Rivlin C01, Yeoh C20) are negative in published fits.
const CONSTANT = [-1000, 1000] as const;

/** What an unknown `kind` falls back to, so that it is reported by name. */
export class ModelDto {
  @IsIn(MODEL_KINDS)
  kind: (typeof MODEL_KINDS)[number];
}

export class NeoHookeanDto {
  @Equals('neo-hookean')
  kind: 'neo-hookean';

  @Finite(...CONSTANT)
  c10: number;
}

export class MooneyRivlinDto {
  @Equals('mooney-rivlin')
  kind: 'mooney-rivlin';

  @Finite(...CONSTANT)
  c10: number;

  @Finite(...CONSTANT)
  c01: number;
}

export class YeohDto {
  @Equals('yeoh')
  kind: 'yeoh';

  @Finite(...CONSTANT)
  c10: number;

  @Finite(...CONSTANT)
  c20: number;

  @Finite(...CONSTANT)
  c30: number;
}

export class OgdenTermDto {
  @Finite(...CONSTANT)
  mu: number;

  @Finite(-50, 50)
  alpha: number;
}

export class OgdenDto {
  @Equals('ogden')
  kind: 'ogden';

  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(6)
  @ValidateNested({ each: true })
  @Type(() => OgdenTermDto)
  terms: OgdenTermDto[];
}

export class GentDto {
  @Equals('gent')
  kind: 'gent';

  @Finite(...CONSTANT)
  mu: number;

  @Finite(0.01, 10_000)
  jm: number;
}

export class ArrudaBoyceDto {
  @Equals('arruda-boyce')
  kind: 'arruda-boyce';

  @Finite(...CONSTANT)
  mu: number;

  @Finite(1.0001, 10_000)
  n: number;
}

/** Up to 20 named constants, each a finite number in the constant range. */
function IsConstants(options?: ValidationOptions) {
  return (target: object, propertyName: string) =>
    registerDecorator({
      name: 'isConstants',
      target: target.constructor,
      propertyName,
      options: {
        message: `${propertyName} must map up to 20 names to numbers from ${CONSTANT[0]} to ${CONSTANT[1]}`,
        ...options,
      },
      validator: {
        validate: (value: unknown) =>
          typeof value === 'object' &&
          value !== null &&
          !Array.isArray(value) &&
          Object.keys(value).length <= 20 &&
          Object.entries(value).every(
            ([name, v]) =>
              /^[A-Za-z][A-Za-z0-9_]{0,15}$/.test(name) &&
              typeof v === 'number' &&
              Number.isFinite(v) &&
              v >= CONSTANT[0] &&
              v <= CONSTANT[1],
          ),
      },
    });
}

export class FormulaDto {
  @Equals('formula')
  kind: 'formula';

  @IsString()
  @Length(1, 500)
  energy: string;

  @IsConstants()
  constants: Record<string, number>;
}

export type ModelBody =
  NeoHookeanDto | MooneyRivlinDto | YeohDto | OgdenDto | GentDto | ArrudaBoyceDto | FormulaDto;

export const MODEL_TYPES = {
  discriminator: {
    property: 'kind',
    subTypes: [
      { value: NeoHookeanDto, name: 'neo-hookean' },
      { value: MooneyRivlinDto, name: 'mooney-rivlin' },
      { value: YeohDto, name: 'yeoh' },
      { value: OgdenDto, name: 'ogden' },
      { value: GentDto, name: 'gent' },
      { value: ArrudaBoyceDto, name: 'arruda-boyce' },
      { value: FormulaDto, name: 'formula' },
    ],
  },
  keepDiscriminatorProperty: true,
};
