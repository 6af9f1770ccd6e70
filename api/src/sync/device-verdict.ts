import type { PartVerdict } from '../engine.js';
import type { DeviceVerdictDto } from './dto/operations.dto.js';

/** The summary of an engine verdict that a tablet sends as `deviceVerdict` (sync/README.md). */
export function deviceVerdictOf({
  status,
  conforming,
  characteristics,
}: PartVerdict): DeviceVerdictDto {
  return {
    status,
    conforming,
    characteristics: Object.fromEntries(characteristics.map((c) => [c.characteristic, c.status])),
  };
}
