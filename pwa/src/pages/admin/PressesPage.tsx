import { IonButton } from '@ionic/react';
import { useForm } from 'react-hook-form';
import { useAdminPresses, useCreatePress, useUpdatePress } from '../../api/admin';
import type { Press, PressKind } from '../../api/types';
import { QueryState } from '../../components/desk/QueryState';
import { Field } from '../../components/Field';
import { Screen } from '../../components/Screen';
import { describeSyncError } from '../../offline/sync';

const KINDS: PressKind[] = ['compression', 'transfer', 'injection'];

interface PressFields {
  code: string;
  name: string;
  kind: PressKind;
  clampForceKn: string;
}

function NewPressForm() {
  const create = useCreatePress();
  const { register, handleSubmit, reset, formState } = useForm<PressFields>({
    defaultValues: { kind: 'compression' },
  });
  const submit = handleSubmit(async (fields) => {
    await create.mutateAsync({
      code: fields.code.trim(),
      name: fields.name.trim(),
      kind: fields.kind,
      clampForceKn: fields.clampForceKn ? Number(fields.clampForceKn) : undefined,
    });
    reset();
  });
  const { errors } = formState;
  return (
    <form onSubmit={(event) => void submit(event).catch(() => undefined)} noValidate>
      <div className="form-grid">
        <Field label="Code" error={errors.code?.message}>
          <input {...register('code', { required: 'A short code, as painted on the press.' })} />
        </Field>
        <Field label="Name" error={errors.name?.message}>
          <input {...register('name', { required: 'A name.' })} />
        </Field>
        <Field label="Kind">
          <select {...register('kind')}>
            {KINDS.map((kind) => (
              <option key={kind}>{kind}</option>
            ))}
          </select>
        </Field>
        <Field label="Clamp force, kN (optional)" error={errors.clampForceKn?.message}>
          <input
            inputMode="decimal"
            {...register('clampForceKn', {
              validate: (v) => !v || Number(v) > 0 || 'A force above 0 kN.',
            })}
          />
        </Field>
      </div>
      {create.error && <p className="field-error">{describeSyncError(create.error)}</p>}
      <div className="form-actions">
        <IonButton type="submit" disabled={formState.isSubmitting}>
          Add press
        </IonButton>
      </div>
    </form>
  );
}

function PressRow({ press }: { press: Press }) {
  const update = useUpdatePress();
  return (
    <tr>
      <td>
        <strong>{press.code}</strong>
      </td>
      <td>{press.name}</td>
      <td>{press.kind}</td>
      <td className="num">{press.clampForceKn ?? '—'}</td>
      <td>
        <label className="check">
          <input
            type="checkbox"
            checked={press.active}
            onChange={(event) => update.mutate({ id: press.id, active: event.target.checked })}
          />
          In use
        </label>
        {update.error && <div className="field-error">{describeSyncError(update.error)}</div>}
      </td>
    </tr>
  );
}

/** The plant's presses; a press taken out of use leaves the inspectors' board at the next sync. */
export function PressesPage() {
  const presses = useAdminPresses();
  return (
    <Screen title="Presses">
      <QueryState query={presses} what="the presses">
        {(list) => (
          <table className="data-table">
            <thead>
              <tr>
                <th>Code</th>
                <th>Name</th>
                <th>Kind</th>
                <th className="num">Clamp kN</th>
                <th>In use</th>
              </tr>
            </thead>
            <tbody>
              {list.map((press) => (
                <PressRow key={press.id} press={press} />
              ))}
            </tbody>
          </table>
        )}
      </QueryState>
      <h2 className="section-title">Add a press</h2>
      <NewPressForm />
    </Screen>
  );
}
