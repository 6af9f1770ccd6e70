import { EngineInputError, requirePositive } from './errors.js';

/** Thicknesses of one compression-set test piece, mm. */
export interface CompressionSetReading {
  /** t₀, before compression. */
  original: number;
  /** tᵢ, after the recovery period (30 min in ASTM D395 B and ISO 815-1). */
  recovered: number;
  /** tₙ, the spacer the piece was held at. */
  spacer: number;
}

/**
 * Compression set C = (t₀ − tᵢ)/(t₀ − tₙ) × 100 % (ASTM D395 Method B, ISO 815-1): the share
 * of the imposed deflection that the rubber did not recover.
 */
export function compressionSetPercent({
  original,
  recovered,
  spacer,
}: CompressionSetReading): number {
  requirePositive('original', original);
  requirePositive('recovered', recovered);
  requirePositive('spacer', spacer);
  if (spacer >= original) {
    throw new EngineInputError('spacer', `must be thinner than the original ${original} mm`);
  }
  if (recovered > original) {
    throw new EngineInputError('recovered', `cannot exceed the original ${original} mm`);
  }
  // A piece cannot recover to less than the spacer it was held at: that would be a set above 100 %.
  if (recovered < spacer) {
    throw new EngineInputError('recovered', `cannot be below the spacer ${spacer} mm`);
  }
  return ((original - recovered) / (original - spacer)) * 100;
}
