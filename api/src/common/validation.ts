import { BadRequestException, ValidationPipe, type ValidationError } from '@nestjs/common';
import { plainToInstance, type ClassConstructor } from 'class-transformer';
import { validate } from 'class-validator';

export interface FieldProblem {
  field: string;
  messages: string[];
}

/** Flattens class-validator's tree into one entry per failing field, named by its full path. */
export function fieldProblems(errors: ValidationError[], prefix = ''): FieldProblem[] {
  return errors.flatMap((error) => {
    const field = prefix ? `${prefix}.${error.property}` : error.property;
    const own = error.constraints
      ? [{ field, messages: Object.values(error.constraints) }]
      : ([] as FieldProblem[]);
    return [...own, ...fieldProblems(error.children ?? [], field)];
  });
}

export function badInput(problems: FieldProblem[]): BadRequestException {
  const first = problems[0] ?? { field: 'body', messages: ['is not valid'] };
  return new BadRequestException({
    statusCode: 400,
    error: 'Bad Request',
    message: `${first.field}: ${first.messages.join('; ')}`,
    field: first.field,
    fields: problems,
  });
}

const OPTIONS = { whitelist: true, forbidNonWhitelisted: true, forbidUnknownValues: true } as const;

export const validationPipe = new ValidationPipe({
  ...OPTIONS,
  transform: true,
  exceptionFactory: (errors) => badInput(fieldProblems(errors)),
});

/**
 * Validates a nested payload the same way the global pipe validates bodies; used where one bad
 * item must be reported by itself instead of failing the whole request (sync operations).
 */
export async function validated<T extends object>(
  type: ClassConstructor<T>,
  plain: unknown,
): Promise<{ value: T } | { problems: FieldProblem[] }> {
  if (typeof plain !== 'object' || plain === null || Array.isArray(plain)) {
    return { problems: [{ field: 'payload', messages: ['payload must be an object'] }] };
  }
  const value = plainToInstance(type, plain);
  const errors = await validate(value, OPTIONS);
  return errors.length ? { problems: fieldProblems(errors, 'payload') } : { value };
}
