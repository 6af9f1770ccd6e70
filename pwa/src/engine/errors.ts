/**
 * The one error the engine throws: an input (named by `field`) is non-physical or not finite.
 * Callers show `reason` to people, so it says what was expected and what came in.
 */
export class EngineInputError extends Error {
  override readonly name = 'EngineInputError';

  constructor(
    readonly field: string,
    readonly reason: string,
  ) {
    super(`${field}: ${reason}`);
  }
}

/** `value`, if it is a finite number. */
export function requireFinite(field: string, value: number): number {
  if (!Number.isFinite(value)) {
    throw new EngineInputError(field, `must be a finite number, got ${value}`);
  }
  return value;
}

/** `value`, if it is finite and above zero. */
export function requirePositive(field: string, value: number): number {
  if (!(requireFinite(field, value) > 0)) {
    throw new EngineInputError(field, `must be above 0, got ${value}`);
  }
  return value;
}

/** `value`, if it is finite and not below zero. */
export function requireNonNegative(field: string, value: number): number {
  if (!(requireFinite(field, value) >= 0)) {
    throw new EngineInputError(field, `must not be below 0, got ${value}`);
  }
  return value;
}

/** `value`, if it is finite and lies in [lo, hi] (both ends included). */
export function requireInRange(field: string, value: number, lo: number, hi: number): number {
  requireFinite(field, value);
  if (value < lo || value > hi) {
    throw new EngineInputError(field, `must lie between ${lo} and ${hi}, got ${value}`);
  }
  return value;
}
