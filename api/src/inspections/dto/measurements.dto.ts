import { z } from 'zod';
import { finite, record } from '../../common/schemas.js';

/** Plan dimensions as measured, named as in the spec's geometry (mm). */
export const dimensionsSchema = record({
  diameter: finite(0.1, 3000).optional(),
  outerDiameter: finite(0.1, 3000).optional(),
  innerDiameter: finite(0.1, 3000).optional(),
  side: finite(0.1, 3000).optional(),
  length: finite(0.1, 3000).optional(),
  width: finite(0.1, 3000).optional(),
});

/** One sampled part's readings; each is optional because a plan may not call for all of them. */
export const measurementsSchema = record({
  thickness: finite(0.05, 500).optional(),
  dimensions: dimensionsSchema.optional(),
  /** Shore A durometer readings: 3 or 5 are usual, the median counts. */
  hardness: z
    .array(finite(0, 100), { error: 'must be a list of 1 to 5 readings' })
    .min(1, { error: 'must be a list of 1 to 5 readings' })
    .max(5, { error: 'must be a list of 1 to 5 readings' })
    .optional(),
  /** N, read at the spec's test deflection. */
  load: finite(0, 10_000_000).optional(),
  /** From a compression-set test piece of the lot (ASTM D395 B / ISO 815-1), percent. */
  compressionSetPercent: finite(0, 100).optional(),
});

export type Measurements = z.infer<typeof measurementsSchema>;
