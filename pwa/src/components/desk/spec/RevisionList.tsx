import type { CompoundRecord, DeskSpecDetail } from '../../../api/desk/types';
import { formatDate } from '../format';
import { revisionState, STATE_WORDS } from './revisions';

interface Props {
  spec: DeskSpecDetail;
  compounds: CompoundRecord[];
  selectedId: string | null;
  onSelect(revisionId: string): void;
}

/** All revisions, newest first, with the one in use marked. */
export function RevisionList({ spec, compounds, selectedId, onSelect }: Props) {
  const revisions = [...spec.revisions].sort((a, b) => b.revision - a.revision);
  if (revisions.length === 0)
    return (
      <p className="desk-muted">No revisions yet: fill in the form and save the first draft.</p>
    );
  return (
    <table className="desk-table" aria-label="Revisions">
      <thead>
        <tr>
          <th scope="col">revision</th>
          <th scope="col">state</th>
          <th scope="col">compound</th>
          <th scope="col">released</th>
          <th scope="col">what changed</th>
          <th scope="col" />
        </tr>
      </thead>
      <tbody>
        {revisions.map((revision) => {
          const state = revisionState(spec, revision);
          const compound = compounds.find((c) => c.id === revision.body.compoundId);
          return (
            <tr
              key={revision.id}
              className={revision.id === selectedId ? 'desk-selected' : undefined}
            >
              <td>rev {revision.revision}</td>
              <td>
                <span className={`desk-badge desk-badge--${state}`} title={STATE_WORDS[state]}>
                  {state}
                </span>
              </td>
              <td>
                {compound?.code ?? '–'}
                {revision.fit ? ` v${revision.fit.version}` : ''}
              </td>
              <td>{formatDate(revision.releasedAt)}</td>
              <td>{revision.body.note ?? ''}</td>
              <td>
                <button
                  type="button"
                  onClick={() => onSelect(revision.id)}
                  disabled={revision.id === selectedId}
                >
                  {state === 'draft' ? 'Edit' : 'View'}
                </button>
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
