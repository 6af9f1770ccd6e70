import { IonButton } from '@ionic/react';
import { useState } from 'react';
import { useReopenLot } from '../../api/review';
import { describeSyncError } from '../../offline/sync';
import { Field } from '../Field';

/** A supervisor sends a lot back to the press for a re-check; the tablets get it at their next sync. */
export function ReopenForm({ lotId }: { lotId: string }) {
  const reopen = useReopenLot(lotId);
  const [note, setNote] = useState('');
  return (
    <form
      onSubmit={(event) => {
        event.preventDefault();
        if (note.trim()) reopen.mutate(note.trim(), { onSuccess: () => setNote('') });
      }}
    >
      <Field label="Send back for a re-check — why">
        <textarea
          rows={2}
          maxLength={1000}
          value={note}
          onChange={(e) => setNote(e.target.value)}
        />
      </Field>
      {reopen.error && <p className="field-error">{describeSyncError(reopen.error)}</p>}
      {reopen.isSuccess && <p>The lot is open again at the press.</p>}
      <div className="form-actions">
        <IonButton type="submit" fill="outline" disabled={!note.trim() || reopen.isPending}>
          Reopen the lot
        </IonButton>
      </div>
    </form>
  );
}
