import type { SpecRevision } from '../api/types';
import type { PartSpec } from '../engine/index';

/**
 * The engine's view of a released revision: the server's frozen copy when it sent one (so the
 * tablet judges exactly as the server will), else the body with the fit the release froze in.
 * Undefined when the revision has no fit: it cannot predict a load.
 */
export function toPartSpec(
  revision: Pick<SpecRevision, 'body' | 'fit' | 'partSpec'>,
): PartSpec | undefined {
  if (revision.partSpec) return revision.partSpec;
  if (!revision.fit) return undefined;
  return { ...revision.body, model: revision.fit.model };
}
