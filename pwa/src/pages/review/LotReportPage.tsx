import { IonButton } from '@ionic/react';
import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { useLotReport, useLotReportCsv } from '../../api/review';
import { QueryState } from '../../components/desk/QueryState';
import { LotReportView } from '../../components/report/LotReportView';
import { Screen } from '../../components/Screen';
import { describeSyncError } from '../../offline/sync';

function download(name: string, text: string) {
  const url = URL.createObjectURL(new Blob([text], { type: 'text/csv;charset=utf-8' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  link.click();
  URL.revokeObjectURL(url);
}

/** The lot report to print or save as PDF, and its CSV, one row per sampled part. */
export function LotReportPage() {
  const { lotId = '' } = useParams();
  const report = useLotReport(lotId);
  const csv = useLotReportCsv();
  const [problem, setProblem] = useState<string>();

  const saveCsv = async () => {
    setProblem(undefined);
    try {
      download(`lot-${report.data?.lot.lotNumber ?? lotId}.csv`, await csv(lotId));
    } catch (error) {
      setProblem(describeSyncError(error));
    }
  };

  return (
    <Screen title="Lot report" back={`/review/${lotId}`}>
      <div className="form-actions no-print">
        <IonButton onClick={() => window.print()}>Print or save as PDF</IonButton>
        <IonButton fill="outline" onClick={() => void saveCsv()} data-testid="report-csv">
          Download CSV
        </IonButton>
      </div>
      {problem && (
        <p className="field-error no-print" role="alert">
          {problem}
        </p>
      )}
      <QueryState query={report} what="the report">
        {(data) => <LotReportView report={data} />}
      </QueryState>
    </Screen>
  );
}
