import { useId, useState } from 'react';
import { useSubmission } from '../useSubmission';
import { ErrorAlert } from '../ErrorAlert';

interface Props {
  onPublish(note: string): Promise<unknown>;
  onCancel?(): void;
  label?: string;
}

/** Publishing makes a fit what every new spec revision uses, so it carries a reason. */
export function PublishForm({
  onPublish,
  onCancel,
  label = 'Publish as the current constants',
}: Props) {
  const id = useId();
  const [note, setNote] = useState('');
  const { busy, error, submit } = useSubmission();

  return (
    <div className="desk-field desk-field--grow">
      <label htmlFor={`${id}-note`}>Why these constants (kept with the version)</label>
      <textarea
        id={`${id}-note`}
        rows={2}
        value={note}
        placeholder="e.g. refit on the March lab series, all three modes"
        onChange={(e) => setNote(e.target.value)}
      />
      {error && <ErrorAlert>{error}</ErrorAlert>}
      <div className="desk-actions">
        <button
          type="button"
          className="desk-primary"
          disabled={busy || !note.trim()}
          onClick={() => void submit(() => onPublish(note.trim()))}
        >
          {busy ? 'Publishing…' : label}
        </button>
        {onCancel && (
          <button type="button" onClick={onCancel}>
            Cancel
          </button>
        )}
      </div>
    </div>
  );
}
