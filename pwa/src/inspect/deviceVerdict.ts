import type { PartVerdict } from '../engine/index';

/**
 * A part's verdict as stored with the record and sent as its `deviceVerdict`: the engine's
 * PartVerdict, exactly what the tablet showed. Read back defensively — it crossed JSON.
 */
export function asPartVerdict(
  stored: Record<string, unknown> | undefined,
): PartVerdict | undefined {
  const { status, characteristics } = (stored ?? {}) as Partial<PartVerdict>;
  return status && Array.isArray(characteristics) ? (stored as unknown as PartVerdict) : undefined;
}
