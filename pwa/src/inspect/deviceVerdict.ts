import type { PartVerdict, VerdictStatus } from '../engine/index';

/**
 * What a record carries as its `deviceVerdict`: the status the tablet showed, overall and per
 * characteristic. The reasons in words stay on the tablet; they follow from the measurements.
 */
export interface WireVerdict {
  status: VerdictStatus;
  conforming: boolean;
  characteristics: Record<string, VerdictStatus>;
}

export function toWireVerdict(verdict: PartVerdict): WireVerdict {
  return {
    status: verdict.status,
    conforming: verdict.conforming,
    characteristics: Object.fromEntries(
      verdict.characteristics.map((c) => [c.characteristic, c.status]),
    ),
  };
}

/** The server's verdict of a record (the engine's PartVerdict), read back defensively. */
export function asPartVerdict(
  stored: Record<string, unknown> | undefined,
): PartVerdict | undefined {
  const { status, characteristics } = (stored ?? {}) as Partial<PartVerdict>;
  return status && Array.isArray(characteristics) ? (stored as unknown as PartVerdict) : undefined;
}
