import { IonButton } from '@ionic/react';
import { useForm } from 'react-hook-form';
import { useRecordDisposition } from '../../api/review';
import type { DispositionAction } from '../../api/types';
import { describeSyncError } from '../../offline/sync';
import { Field } from '../Field';
import './disposition.css';

export const ACTIONS: { value: DispositionAction; label: string; note: string }[] = [
  { value: 'release', label: 'Release', note: 'ship as it is' },
  { value: 'hold', label: 'Hold', note: 'keep it until more is known' },
  { value: 'sort-all', label: 'Sort all', note: 'check every part, keep the good ones' },
  { value: 'rework', label: 'Rework', note: 'trim or repair, then re-check' },
  { value: 'scrap', label: 'Scrap', note: 'the whole lot' },
];

interface DispositionFields {
  action: DispositionAction;
  note: string;
}

/** The supervisor's decision on a flagged lot; the note says why, for the audit and the customer. */
export function DispositionForm({ lotId }: { lotId: string }) {
  const record = useRecordDisposition(lotId);
  const { register, handleSubmit, formState, reset } = useForm<DispositionFields>();
  const submit = handleSubmit(async (fields) => {
    await record.mutateAsync({ action: fields.action, note: fields.note.trim() });
    reset();
  });

  return (
    <form onSubmit={(event) => void submit(event).catch(() => undefined)} noValidate>
      <fieldset className="disposition-actions">
        <legend>Decision</legend>
        {ACTIONS.map((action) => (
          <label key={action.value} className="disposition-action">
            <input
              type="radio"
              value={action.value}
              {...register('action', { required: 'Choose what happens to the lot.' })}
            />
            <strong>{action.label}</strong>
            <span>{action.note}</span>
          </label>
        ))}
      </fieldset>
      {formState.errors.action && (
        <p className="field-error" role="alert">
          {formState.errors.action.message}
        </p>
      )}
      <Field label="Why" error={formState.errors.note?.message}>
        <textarea
          rows={3}
          maxLength={2000}
          {...register('note', {
            validate: (value) => value.trim().length > 0 || 'Say why, in a few words.',
          })}
        />
      </Field>
      {record.error && (
        <p className="field-error" role="alert">
          {describeSyncError(record.error)}
        </p>
      )}
      <div className="form-actions">
        <IonButton type="submit" disabled={formState.isSubmitting}>
          Record decision
        </IonButton>
      </div>
    </form>
  );
}
