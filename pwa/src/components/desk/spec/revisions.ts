import type { DeskSpecDetail, DeskSpecRevision } from '../../../api/desk/types';

export type RevisionState = 'draft' | 'released' | 'superseded';

/**
 * The server stores draft or released; a released revision that a later release replaced is
 * superseded: kept for the lots opened against it, never used for new ones.
 */
export function revisionState(spec: DeskSpecDetail, revision: DeskSpecRevision): RevisionState {
  if (revision.status === 'draft') return 'draft';
  if (revision.id === spec.currentRevisionId) return 'released';
  const later = spec.revisions.some(
    (r) => r.status === 'released' && r.revision > revision.revision,
  );
  return later ? 'superseded' : 'released';
}

export const STATE_WORDS: Record<RevisionState, string> = {
  draft: 'draft — editable',
  released: 'released — in use, frozen',
  superseded: 'superseded — frozen',
};
