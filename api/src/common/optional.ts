import { ValidateIf } from 'class-validator';

/**
 * The field may be left out, but if it is there it must be valid: unlike class-validator's
 * IsOptional, a null is checked (and refused) rather than waved through into the database.
 */
export const Optional = () => ValidateIf((_object, value) => value !== undefined);
