import { IonButton } from '@ionic/react';
import { useEffect, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { useParams, useSearchParams } from 'react-router-dom';
import type { PulledSpec } from '../../api/types';
import type { PartVerdict, PreparedSpec } from '../../engine/index';
import { useSession } from '../../auth/session';
import { CautionNote } from '../../components/inspect/CautionNote';
import { QuantityField } from '../../components/inspect/QuantityField';
import { StandingBadge } from '../../components/inspect/StandingBadge';
import { VerdictPanel } from '../../components/inspect/VerdictPanel';
import { Screen } from '../../components/Screen';
import { useGo } from '../../components/useGo';
import type { Engine } from '../../inspect/engine';
import {
  partFields,
  partTexts,
  readPart,
  type PartTexts,
  type ReadPart,
} from '../../inspect/partForm';
import { usePreparedSpec } from '../../inspect/usePreparedSpec';
import { loadUnitParser, toTyped } from '../../inspect/units';
import { useLot, useLotRecords, useSpecRevision } from '../../offline/catalog';
import type { DevicePerson } from '../../offline/db';
import { recordPart, type LocalLot, type LocalPart } from '../../offline/records';
import { syncScheduler } from '../../offline/scheduler';
import '../../components/inspect/verdict-panel.css';

interface Judged {
  verdict?: PartVerdict;
  problem?: string;
  /** The engine's objection, on the field it names. */
  fieldProblems: Record<string, string>;
}

function judge(engine: Engine, prepared: PreparedSpec, read: ReadPart): Judged {
  if (read.empty) return { fieldProblems: {} };
  try {
    return { verdict: engine.partVerdict(prepared, read.measurements), fieldProblems: {} };
  } catch (error) {
    if (!(error instanceof engine.EngineInputError)) throw error;
    return {
      problem: `${error.field}: ${error.reason}`,
      fieldProblems: { [error.field]: error.reason },
    };
  }
}

interface EntryProps {
  lot: LocalLot;
  spec: PulledSpec;
  engine: Engine;
  prepared: PreparedSpec;
  person: DevicePerson;
  sampleIndex: number;
  correcting?: LocalPart;
  onSaved(part: LocalPart): void;
}

function PartEntry({
  lot,
  spec,
  engine,
  prepared,
  person,
  sampleIndex,
  correcting,
  onSaved,
}: EntryProps) {
  const [readings, setReadings] = useState<3 | 5>(
    correcting?.measurements.hardness?.length === 5 ? 5 : 3,
  );
  const [, setUnitParser] = useState(false);
  const fields = partFields(spec.body.geometry, readings);
  const { register, control, handleSubmit, formState, setFocus } = useForm<PartTexts>({
    defaultValues: correcting
      ? partTexts(fields, correcting.measurements, (si, kind) => toTyped(si, kind, person.units))
      : {},
  });
  useEffect(() => {
    // Warm mathjs so that the first value typed with a unit is read at once.
    void loadUnitParser().then(() => setUnitParser(true));
    setFocus('thickness');
  }, [setFocus]);

  const read = readPart(fields, useWatch({ control }), person.units);
  const { verdict, problem, fieldProblems } = judge(engine, prepared, read);
  const problems = { ...fieldProblems, ...read.problems };
  const blocked = read.empty || !verdict || Object.keys(problems).length > 0;

  const save = handleSubmit(async () => {
    if (blocked) return;
    onSaved(
      await recordPart(
        {
          lotId: lot.id,
          sampleIndex,
          supersedes: correcting?.id,
          measurements: read.measurements,
          verdict,
          conforming: verdict.conforming,
        },
        person.userId,
      ),
    );
  });

  return (
    <form className="part-entry" onSubmit={(event) => void save(event)} noValidate>
      <div>
        <div className="form-grid">
          {fields.map((field) => (
            <QuantityField
              key={field.name}
              label={field.label}
              kind={field.kind}
              units={person.units}
              registration={register(field.name)}
              problem={problems[field.name]}
            />
          ))}
        </div>
        <div className="form-actions">
          <IonButton type="submit" size="large" disabled={blocked || formState.isSubmitting}>
            {correcting ? `Save correction of part ${sampleIndex}` : `Save part ${sampleIndex}`}
          </IonButton>
          <IonButton fill="outline" onClick={() => setReadings(readings === 3 ? 5 : 3)}>
            {readings === 3 ? 'Five hardness readings' : 'Three hardness readings'}
          </IonButton>
        </div>
        <CautionNote body={spec.body} />
      </div>
      <VerdictPanel verdict={verdict} problem={problem} />
    </form>
  );
}

/** One sampled part: its measurements, with the engine's verdict as each value is typed. */
export function PartPage() {
  const { lotId } = useParams();
  const [search] = useSearchParams();
  const go = useGo();
  const { person } = useSession();
  const lot = useLot(lotId);
  const spec = useSpecRevision(lot?.specRevisionId);
  const records = useLotRecords(lotId);
  const { engine, prepared, problem } = usePreparedSpec(spec);
  const [saved, setSaved] = useState<LocalPart>();

  const correcting = records?.parts.find((part) => part.id === search.get('correct'));
  // The next part follows the one just saved at once, not when the device store's live query
  // catches up: a remount a moment later would throw away what is being typed.
  const sampleIndex =
    correcting?.sampleIndex ??
    Math.max((records?.parts.length ?? 0) + 1, saved ? saved.sampleIndex + 1 : 1);
  const ready = lot && spec && records && engine && prepared && person;
  const title = lot
    ? `Lot ${lot.lotNumber} · part ${sampleIndex} of ${lot.plan.sampleSize}`
    : 'Part';

  const onSaved = (part: LocalPart) => {
    syncScheduler.syncSoon();
    setSaved(part);
    if (correcting || part.sampleIndex >= (lot?.plan.sampleSize ?? 0)) {
      go.back(`/lots/${lotId}`);
    }
  };

  return (
    <Screen title={title} back={`/lots/${lotId}`}>
      {saved && (
        <p className="saved-note" data-testid="saved-note">
          Part {saved.sampleIndex} saved on this tablet{' '}
          <StandingBadge standing={saved.verdict.status} />
          <IonButton fill="clear" routerLink={`/lots/${lotId}/defect?part=${saved.id}`}>
            Log a defect on it
          </IonButton>
          <IonButton fill="clear" routerLink={`/lots/${lotId}`}>
            Back to the lot
          </IonButton>
        </p>
      )}
      {problem && (
        <p className="field-error" role="alert">
          {problem}
        </p>
      )}
      {ready && (
        <PartEntry
          key={`${correcting?.id ?? 'new'}-${sampleIndex}`}
          lot={lot}
          spec={spec}
          engine={engine}
          prepared={prepared}
          person={person}
          sampleIndex={sampleIndex}
          correcting={correcting}
          onSaved={onSaved}
        />
      )}
    </Screen>
  );
}
