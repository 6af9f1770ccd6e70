import { IonButton } from '@ionic/react';
import { useParams } from 'react-router-dom';
import { usePresses } from '../../api/desk/lots';
import { useSpec } from '../../api/desk/specs';
import { useLotDetail } from '../../api/review';
import type { LotDetail } from '../../api/types';
import { useSession } from '../../auth/session';
import { QueryState } from '../../components/desk/QueryState';
import { CautionNote } from '../../components/inspect/CautionNote';
import { PlanSummary } from '../../components/inspect/PlanSummary';
import { DefectPhotos } from '../../components/review/DefectPhotos';
import { DispositionForm } from '../../components/review/DispositionForm';
import { DispositionHistory } from '../../components/review/DispositionHistory';
import { InspectionTable } from '../../components/review/InspectionTable';
import { LoadChartPanel } from '../../components/review/LoadChartPanel';
import { ReopenForm } from '../../components/review/ReopenForm';
import { Screen } from '../../components/Screen';
import { when } from '../../components/time';

function LotReview({ lot }: { lot: LotDetail }) {
  const { person } = useSession();
  const spec = useSpec(lot.specId);
  const press = usePresses().data?.find((p) => p.id === lot.pressId);
  const revision = spec.data?.revisions.find((r) => r.id === lot.specRevisionId);

  const bad = lot.nonconforming === 1 ? '1 bad part' : `${lot.nonconforming} bad parts`;

  return (
    <>
      <div className="two-columns">
        <div>
          <dl className="facts">
            <div>
              <dt>Part</dt>
              <dd>
                {spec.data?.partNumber} rev {revision?.revision}
              </dd>
            </div>
            <div>
              <dt>Press</dt>
              <dd>{press?.code}</dd>
            </div>
            <div>
              <dt>Cavity</dt>
              <dd>{lot.cavity}</dd>
            </div>
            <div>
              <dt>Lot size</dt>
              <dd>{lot.lotSize}</dd>
            </div>
            <div>
              <dt>Flagged</dt>
              <dd>{when(lot.flaggedAt)}</dd>
            </div>
          </dl>
          <p className="lot-standing lot-standing-reject" data-testid="server-standing">
            {bad} of {lot.plan.sampleSize} checked; the plan flags the lot at {lot.plan.reject}.
          </p>
          {revision && <PlanSummary plan={lot.plan} sampling={revision.body.sampling} />}
        </div>
        <div>
          <LoadChartPanel revision={revision} inspections={lot.inspections} />
        </div>
      </div>
      <h2 className="section-title">Sampled parts</h2>
      <div className="table-scroll">
        <InspectionTable inspections={lot.inspections} units={person?.units ?? 'metric'} />
      </div>
      <div className="two-columns">
        <div>
          <h2 className="section-title">Defects</h2>
          <DefectPhotos defects={lot.defects} inspections={lot.inspections} />
        </div>
        <div>
          <h2 className="section-title">Decision</h2>
          <DispositionHistory dispositions={lot.dispositions} />
          <DispositionForm lotId={lot.id} />
          {person?.role === 'supervisor' && lot.status === 'submitted' && (
            <ReopenForm lotId={lot.id} />
          )}
          <IonButton fill="outline" routerLink={`/review/${lot.id}/report`}>
            Open the lot report
          </IonButton>
          {revision && <CautionNote body={revision.body} />}
        </div>
      </div>
    </>
  );
}

/** One flagged lot: its parts, photos and load chart beside the disposition form. */
export function LotReviewPage() {
  const { lotId } = useParams();
  const lot = useLotDetail(lotId);
  return (
    <Screen title={`Review lot ${lot.data?.lotNumber ?? ''}`} back="/review">
      <QueryState query={lot} what="the lot">
        {(data) => <LotReview lot={data} />}
      </QueryState>
    </Screen>
  );
}
