import { IonButton } from '@ionic/react';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { useParams, useSearchParams } from 'react-router-dom';
import type { DefectLocation, DefectSeverity } from '../../api/types';
import { useSession } from '../../auth/session';
import { Field } from '../../components/Field';
import { PhotoPicker } from '../../components/inspect/PhotoPicker';
import { Screen } from '../../components/Screen';
import { useGo } from '../../components/useGo';
import { DEFECT_TYPES, LOCATIONS, SEVERITIES } from '../../inspect/defects';
import { useLot, useLotRecords } from '../../offline/catalog';
import {
  recordDefect,
  type LocalLot,
  type LocalPart,
  type PhotoToKeep,
} from '../../offline/records';
import { syncScheduler } from '../../offline/scheduler';
import '../../components/inspect/defect.css';

interface DefectForm {
  partId: string;
  type: string;
  location: DefectLocation;
  severity: DefectSeverity;
  sizeMm: string;
  note: string;
}

/** Logs a visual defect, usually on the part just measured, with a photo kept on the tablet. */
export function DefectPage() {
  const { lotId } = useParams();
  const lot = useLot(lotId);
  const records = useLotRecords(lotId);
  return (
    <Screen title={`Defect in lot ${lot?.lotNumber ?? ''}`} back={`/lots/${lotId}`}>
      {lot && records && <DefectEntry lot={lot} parts={records.parts} />}
    </Screen>
  );
}

function DefectEntry({ lot, parts }: { lot: LocalLot; parts: LocalPart[] }) {
  const [search] = useSearchParams();
  const go = useGo();
  const { person } = useSession();
  const [photo, setPhoto] = useState<PhotoToKeep>();
  const { register, handleSubmit, formState } = useForm<DefectForm>({
    defaultValues: {
      partId: search.get('part') ?? parts.at(-1)?.id ?? '',
      location: 'cosmetic',
      severity: 'major',
    },
  });

  const submit = handleSubmit(async (form) => {
    if (!person) return;
    await recordDefect(
      {
        lotId: lot.id,
        partId: form.partId || undefined,
        type: form.type,
        location: form.location,
        severity: form.severity,
        sizeMm: form.sizeMm ? Number(form.sizeMm.replace(',', '.')) : undefined,
        note: form.note?.trim() || undefined,
      },
      photo,
      person.userId,
    );
    syncScheduler.syncSoon();
    go.back(`/lots/${lot.id}`);
  });

  const { errors } = formState;
  return (
    <form onSubmit={(event) => void submit(event)} noValidate>
      <div className="form-grid">
        <Field label="On part">
          <select {...register('partId')}>
            <option value="">Not on a sampled part</option>
            {parts.map((part) => (
              <option key={part.id} value={part.id}>
                Part {part.sampleIndex}
              </option>
            ))}
          </select>
        </Field>
        <Field label="Defect" error={errors.type?.message}>
          <select {...register('type', { required: 'What kind of defect?' })}>
            <option value="">Choose…</option>
            {DEFECT_TYPES.map((type) => (
              <option key={type.value} value={type.value}>
                {type.label}
              </option>
            ))}
          </select>
        </Field>
        <Field label="Where">
          <select {...register('location')}>
            {LOCATIONS.map((location) => (
              <option key={location.value} value={location.value}>
                {location.label}
              </option>
            ))}
          </select>
        </Field>
        <Field label="Size (mm, optional)" error={errors.sizeMm?.message}>
          <input
            inputMode="decimal"
            {...register('sizeMm', {
              validate: (value) =>
                !value ||
                (Number(value.replace(',', '.')) > 0 && Number(value.replace(',', '.')) < 1000) ||
                'A size in mm, above 0.',
            })}
          />
        </Field>
      </div>
      <fieldset className="severity-choice">
        <legend>How bad</legend>
        {SEVERITIES.map((severity) => (
          <label key={severity.value} className={`severity severity-${severity.value}`}>
            <input type="radio" value={severity.value} {...register('severity')} />
            <strong>{severity.label}</strong>
            <span>{severity.note}</span>
          </label>
        ))}
      </fieldset>
      <Field label="Note (optional)">
        <textarea rows={2} maxLength={500} {...register('note')} />
      </Field>
      <h2 className="section-title">Photo</h2>
      <PhotoPicker photo={photo} onChange={setPhoto} />
      <div className="form-actions">
        <IonButton type="submit" size="large" disabled={formState.isSubmitting}>
          Save defect
        </IonButton>
      </div>
    </form>
  );
}
