import type { SpecRevision } from '../api/types';
import type { PartSpec } from '../engine/part-spec';

/**
 * The engine's view of a released revision: the spec body with the compound's fit that the
 * release froze into it. Undefined when the revision has no fit (it cannot predict a load).
 */
export function toPartSpec(revision: Pick<SpecRevision, 'body' | 'fit'>): PartSpec | undefined {
  if (!revision.fit) return undefined;
  return { ...revision.body, model: revision.fit.model };
}
