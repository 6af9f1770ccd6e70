import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { useCompounds } from '../../api/desk/compounds';
import { useReleaseRevision, useSaveDraft, useSpec } from '../../api/desk/specs';
import type { CompoundRecord, DeskSpecBody, DeskSpecDetail } from '../../api/desk/types';
import { DeskLayout } from '../../components/desk/DeskLayout';
import { QueryState } from '../../components/desk/QueryState';
import { RevisionList } from '../../components/desk/spec/RevisionList';
import { revisionState } from '../../components/desk/spec/revisions';
import { SpecEditor } from '../../components/desk/spec/SpecEditor';
import {
  fieldsFromBody,
  NEW_SPEC_FIELDS,
  type SpecFields,
} from '../../components/desk/spec/specForm';
import { ErrorAlert } from '../../components/desk/ErrorAlert';

/** What the editor shows: a stored revision, or a new draft started from one (or from scratch). */
type Editing = { kind: 'stored'; revisionId: string } | { kind: 'new'; from: SpecFields };

function latest(spec: DeskSpecDetail) {
  return [...spec.revisions].sort((a, b) => b.revision - a.revision)[0];
}

function DraftActions({
  spec,
  revisionId,
  body,
  onSaved,
}: {
  spec: DeskSpecDetail;
  revisionId?: string;
  body: DeskSpecBody | null;
  onSaved(revisionId: string): void;
}) {
  const save = useSaveDraft(spec.id);
  const release = useReleaseRevision(spec.id);
  const [confirming, setConfirming] = useState(false);
  const busy = save.isPending || release.isPending;
  const error = save.error ?? release.error;

  async function saveDraft() {
    if (!body) return null;
    const saved = await save.mutateAsync({ revisionId, body });
    onSaved(saved.id);
    return saved.id;
  }

  async function saveAndRelease() {
    const id = await saveDraft();
    if (id) await release.mutateAsync(id);
    setConfirming(false);
  }

  return (
    <div className="desk-card">
      {error && <ErrorAlert>The server refused: {error.message}</ErrorAlert>}
      {confirming ? (
        <>
          <p>
            Releasing freezes this revision with the compound's current constants. Tablets pull it
            and every new lot of {spec.partNumber} is checked against it; the revision in use now
            becomes superseded.
          </p>
          <div className="desk-actions">
            <button
              type="button"
              className="desk-primary"
              disabled={busy || !body}
              onClick={() => void saveAndRelease()}
            >
              Release it
            </button>
            <button type="button" onClick={() => setConfirming(false)}>
              Not yet
            </button>
          </div>
        </>
      ) : (
        <div className="desk-actions">
          <button type="button" disabled={busy || !body} onClick={() => void saveDraft()}>
            {revisionId ? 'Save draft' : 'Save as a new draft'}
          </button>
          <button
            type="button"
            className="desk-primary"
            disabled={busy || !body}
            onClick={() => setConfirming(true)}
          >
            Release…
          </button>
        </div>
      )}
    </div>
  );
}

function Spec({ spec, compounds }: { spec: DeskSpecDetail; compounds: CompoundRecord[] }) {
  const newest = latest(spec);
  const [editing, setEditing] = useState<Editing>(
    newest ? { kind: 'stored', revisionId: newest.id } : { kind: 'new', from: NEW_SPEC_FIELDS },
  );
  const stored =
    editing.kind === 'stored' ? spec.revisions.find((r) => r.id === editing.revisionId) : undefined;
  const state = stored ? revisionState(spec, stored) : 'draft';
  const readOnly = state !== 'draft';
  const editorKey = stored ? stored.id : `new-${newest?.id ?? 'first'}`;
  const initial = stored
    ? fieldsFromBody(stored.body)
    : editing.kind === 'new'
      ? editing.from
      : null;
  const hasDraft = spec.revisions.some((r) => r.status === 'draft');

  return (
    <>
      <div className="desk-row desk-row--between">
        <h1>
          {spec.partNumber} · {spec.name}
        </h1>
        {!hasDraft && newest && (
          <button
            type="button"
            className="desk-primary"
            onClick={() =>
              setEditing({ kind: 'new', from: { ...fieldsFromBody(newest.body), note: '' } })
            }
          >
            Start revision {newest.revision + 1}
          </button>
        )}
      </div>
      {spec.description && <p className="desk-muted">{spec.description}</p>}
      <RevisionList
        spec={spec}
        compounds={compounds}
        selectedId={stored?.id ?? null}
        onSelect={(revisionId) => setEditing({ kind: 'stored', revisionId })}
      />
      <h2>
        {stored ? `Revision ${stored.revision}` : `New revision ${(newest?.revision ?? 0) + 1}`} ·{' '}
        {state}
      </h2>
      {initial === null ? (
        <p className="desk-muted">Fetching the revision…</p>
      ) : (
        <SpecEditor
          key={editorKey}
          initial={initial}
          compounds={compounds}
          readOnly={readOnly}
          frozenFit={readOnly ? stored?.fit : undefined}
          actions={(body) =>
            readOnly ? null : (
              <DraftActions
                spec={spec}
                revisionId={stored?.id}
                body={body}
                onSaved={(revisionId) => setEditing({ kind: 'stored', revisionId })}
              />
            )
          }
        />
      )}
    </>
  );
}

/** One part spec: its revisions and the editor with everything derived from it. */
export default function SpecPage() {
  const { specId } = useParams();
  const spec = useSpec(specId);
  const compounds = useCompounds();
  return (
    <DeskLayout title="Part spec">
      <QueryState query={spec} what="the part spec">
        {(data) => (
          <QueryState query={compounds} what="the compounds">
            {(list) => <Spec spec={data} compounds={list} />}
          </QueryState>
        )}
      </QueryState>
    </DeskLayout>
  );
}
