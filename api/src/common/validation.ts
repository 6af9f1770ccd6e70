import { BadRequestException, ValidationPipe, type ValidationError } from '@nestjs/common';
import { useContainer } from 'class-validator';

/**
 * class-validator looks up a constraint's instance for every check it makes, and its own store
 * does so by a linear search over every constraint class ever declared (one per decorated
 * property): large bodies spent most of their time there. A map does the same job.
 */
const constraints = new Map<unknown, unknown>();
useContainer({
  get<T>(type: new () => T): T {
    if (!constraints.has(type)) constraints.set(type, new type());
    return constraints.get(type) as T;
  },
});

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

export const VALIDATION_OPTIONS = {
  whitelist: true,
  forbidNonWhitelisted: true,
  forbidUnknownValues: true,
} as const;

export const validationPipe = new ValidationPipe({
  ...VALIDATION_OPTIONS,
  transform: true,
  exceptionFactory: (errors) => badInput(fieldProblems(errors)),
});
