import { IonButton } from '@ionic/react';
import { useForm, useWatch } from 'react-hook-form';
import { useParams } from 'react-router-dom';
import type { LotPlan, PulledSpec } from '../../api/types';
import { useSession } from '../../auth/session';
import { Field } from '../../components/Field';
import { CautionNote } from '../../components/inspect/CautionNote';
import { PlanSummary } from '../../components/inspect/PlanSummary';
import { Screen } from '../../components/Screen';
import { useGo } from '../../components/useGo';
import { useEngine, type Engine } from '../../inspect/engine';
import { useOpenLots, usePresses, useReleasedSpecs } from '../../offline/catalog';
import { openLot } from '../../offline/records';
import { syncScheduler } from '../../offline/scheduler';

interface LotForm {
  specId: string;
  lotNumber: string;
  lotSize: string;
  cavity: string;
  moldedOn: string;
}

function today(): string {
  return new Date().toISOString().slice(0, 10);
}

/** The plan for the typed lot size, or the engine's reason why there is none. */
function planFor(
  engine: Engine | undefined,
  spec: PulledSpec | undefined,
  lotSize: number,
): { plan?: LotPlan; problem?: string } {
  if (!engine || !spec || !lotSize) return {};
  try {
    return { plan: engine.samplingPlan({ lotSize, ...spec.body.sampling }) };
  } catch (error) {
    return { problem: error instanceof engine.EngineInputError ? error.reason : String(error) };
  }
}

const WHOLE = /^\d+$/;

export function OpenLotPage() {
  const { pressId } = useParams();
  const go = useGo();
  const { person } = useSession();
  const engine = useEngine();
  const press = usePresses()?.find((p) => p.id === pressId);
  const specs = useReleasedSpecs();
  const openLots = useOpenLots();
  const { register, handleSubmit, control, formState } = useForm<LotForm>({
    defaultValues: { cavity: '1', moldedOn: today() },
  });
  const [specId, typedSize] = useWatch({ control, name: ['specId', 'lotSize'] });
  const spec = specs?.find((s) => s.specId === specId);
  const lotSize = WHOLE.test(typedSize ?? '') ? Number(typedSize) : 0;
  const { plan, problem } = planFor(engine, spec, lotSize);

  const submit = handleSubmit(async (form) => {
    if (!person || !spec || !plan || !pressId) return;
    const lot = await openLot(
      {
        lotNumber: form.lotNumber.trim(),
        specId: spec.specId,
        specRevisionId: spec.id,
        pressId,
        cavity: Number(form.cavity),
        lotSize,
        moldedAt: new Date(`${form.moldedOn}T00:00:00`).toISOString(),
        plan: {
          codeLetter: plan.codeLetter,
          planLetter: plan.planLetter,
          sampleSize: plan.sampleSize,
          accept: plan.accept,
          reject: plan.reject,
        },
      },
      person.userId,
    );
    syncScheduler.syncSoon();
    go.instead(`/lots/${lot.id}`);
  });

  const { errors } = formState;
  return (
    <Screen title={`Start a lot on ${press?.code ?? 'press'}`} back="/presses">
      <form onSubmit={(event) => void submit(event)} noValidate>
        <div className="form-grid">
          <Field label="Part" error={errors.specId?.message}>
            <select {...register('specId', { required: 'Choose the part.' })}>
              <option value="">Choose…</option>
              {specs?.map((s) => (
                <option key={s.id} value={s.specId}>
                  {s.partNumber} — {s.name} (rev {s.revision})
                </option>
              ))}
            </select>
          </Field>
          <Field label="Lot number" error={errors.lotNumber?.message}>
            <input
              autoComplete="off"
              {...register('lotNumber', {
                required: 'Type the lot number from the tag.',
                maxLength: { value: 40, message: 'At most 40 characters.' },
                validate: (value) =>
                  !openLots?.some((lot) => lot.lotNumber === value.trim()) ||
                  'A lot with this number is already open.',
              })}
            />
          </Field>
          <Field label="Lot size (parts)" error={errors.lotSize?.message}>
            <input
              inputMode="numeric"
              {...register('lotSize', {
                required: 'How many parts are in the lot?',
                validate: (value) =>
                  (WHOLE.test(value) && Number(value) >= 1 && Number(value) <= 1_000_000) ||
                  'A whole number from 1 to 1 000 000.',
              })}
            />
          </Field>
          <Field label="Cavity" error={errors.cavity?.message}>
            <input
              inputMode="numeric"
              {...register('cavity', {
                validate: (value) =>
                  (WHOLE.test(value) && Number(value) >= 1 && Number(value) <= 999) ||
                  'A cavity number from 1 to 999.',
              })}
            />
          </Field>
          <Field label="Molded on" error={errors.moldedOn?.message}>
            <input type="date" max={today()} {...register('moldedOn', { required: 'When?' })} />
          </Field>
        </div>
        {plan && spec && <PlanSummary plan={plan} sampling={spec.body.sampling} />}
        {problem && (
          <p className="field-error" role="alert">
            {problem}
          </p>
        )}
        {spec && <CautionNote body={spec.body} />}
        <div className="form-actions">
          <IonButton type="submit" size="large" disabled={!plan || formState.isSubmitting}>
            Start checking
          </IonButton>
        </div>
      </form>
    </Screen>
  );
}
