import { IonButton, useIonAlert } from '@ionic/react';
import { useParams } from 'react-router-dom';
import { useSession } from '../../auth/session';
import { CautionNote } from '../../components/inspect/CautionNote';
import { DefectList } from '../../components/inspect/DefectList';
import { LotFacts } from '../../components/inspect/LotFacts';
import { LotStanding } from '../../components/inspect/LotStanding';
import { PartsTable } from '../../components/inspect/PartsTable';
import { PlanSummary } from '../../components/inspect/PlanSummary';
import { Screen } from '../../components/Screen';
import { useGo } from '../../components/useGo';
import { lotTally } from '../../inspect/lotTally';
import { usePreparedSpec } from '../../inspect/usePreparedSpec';
import { useLot, useLotRecords, useSpecRevision } from '../../offline/catalog';
import { submitLot } from '../../offline/records';
import { syncScheduler } from '../../offline/scheduler';

/** One lot at the press: its plan, where it stands, the parts and defects, and finishing it. */
export function LotPage() {
  const { lotId } = useParams();
  const go = useGo();
  const { person } = useSession();
  const lot = useLot(lotId);
  const spec = useSpecRevision(lot?.specRevisionId);
  const { engine, prepared, problem } = usePreparedSpec(spec);
  const records = useLotRecords(lotId);
  const [confirm] = useIonAlert();

  if (lot === null) {
    return (
      <Screen title="Lot" back="/presses">
        <p>This lot is not on this tablet.</p>
      </Screen>
    );
  }
  if (!lot || !records)
    return (
      <Screen title="Lot" back="/presses">
        {null}
      </Screen>
    );

  const tally = engine && prepared ? lotTally(engine, prepared, lot.plan, records) : undefined;
  const decision = tally?.lot.decision;
  const open = lot.status === 'open';
  const next = records.parts.length + 1;
  const full = records.parts.length >= lot.plan.sampleSize;

  const finish = () => {
    if (!tally || !person || decision === 'open') return;
    const verdict = decision === 'reject' ? 'flagged' : 'pass';
    void confirm({
      header: verdict === 'flagged' ? 'Finish this lot as flagged?' : 'Finish this lot as passed?',
      message: 'The lot closes on this tablet and goes to the server with its parts.',
      buttons: [
        { text: 'Not yet', role: 'cancel' },
        {
          text: 'Finish lot',
          handler: () =>
            void submitLot(
              lot.id,
              { verdict, nonconforming: tally.lot.nonconforming },
              person.userId,
            )
              .then(() => syncScheduler.syncSoon())
              .then(() => go.root('/presses')),
        },
      ],
    });
  };

  return (
    <Screen title={`Lot ${lot.lotNumber}`} back="/presses">
      <LotFacts lot={lot} spec={spec} />
      {spec && <PlanSummary plan={lot.plan} sampling={spec.body.sampling} />}
      {tally && <LotStanding verdict={tally.lot} plan={lot.plan} />}
      {problem && (
        <p className="field-error" role="alert">
          {problem}
        </p>
      )}
      {!open && (
        <p data-testid="lot-finished">
          Finished on this tablet as <strong>{lot.verdict?.verdict}</strong>.
        </p>
      )}
      {open && (
        <div className="form-actions">
          <IonButton size="large" routerLink={`/lots/${lot.id}/part`} disabled={full}>
            {full ? 'All parts checked' : `Check part ${next}`}
          </IonButton>
          <IonButton size="large" fill="outline" routerLink={`/lots/${lot.id}/defect`}>
            Log a defect
          </IonButton>
          <IonButton
            size="large"
            color="secondary"
            onClick={finish}
            disabled={!decision || decision === 'open'}
          >
            Finish lot
          </IonButton>
        </div>
      )}
      {spec && <CautionNote body={spec.body} />}
      <h2 className="section-title">Parts</h2>
      <PartsTable
        records={records}
        tally={tally}
        units={person?.units ?? 'metric'}
        correctable={open}
      />
      <h2 className="section-title">Defects</h2>
      <DefectList records={records} />
    </Screen>
  );
}
