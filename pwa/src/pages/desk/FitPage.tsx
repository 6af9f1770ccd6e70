import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { useCompound, useSaveFit } from '../../api/desk/compounds';
import type { CompoundDetail } from '../../api/desk/types';
import { DeskLayout } from '../../components/desk/DeskLayout';
import { FitActions } from '../../components/desk/fit/FitActions';
import type { FitOutcome } from '../../components/desk/fit/fitJob';
import { FitPlots } from '../../components/desk/fit/FitPlots';
import { FitSetup, type FitRequest } from '../../components/desk/fit/FitSetup';
import { FitTable } from '../../components/desk/fit/FitTable';
import { BUILT_IN_CHOICES, formulaChoice } from '../../components/desk/fit/modelChoices';
import { runFits } from '../../components/desk/fit/runFits';
import { StabilityTable } from '../../components/desk/fit/StabilityTable';
import { useFormulaLibrary } from '../../components/desk/formula/formulaLibrary';
import { QueryState } from '../../components/desk/QueryState';

interface Run {
  request: FitRequest;
  outcomes: FitOutcome[];
}

function Workbench({ compound }: { compound: CompoundDetail }) {
  const { formulas } = useFormulaLibrary();
  const save = useSaveFit(compound.id);
  const [busy, setBusy] = useState(false);
  const [run, setRun] = useState<Run | null>(null);
  const choices = [...BUILT_IN_CHOICES, ...formulas.map(formulaChoice)];

  async function fit(request: FitRequest) {
    setBusy(true);
    const outcomes = await runFits(
      request.choices.map((choice) => ({
        label: choice.label,
        options: {
          model: choice.start(request.data),
          data: request.data,
          objective: request.objective,
          weights: request.weights,
        },
      })),
    );
    setRun({ request, outcomes });
    setBusy(false);
  }

  if (compound.testSets.length === 0) {
    return (
      <p className="desk-callout desk-callout--warn">
        {compound.code} has no test data yet.{' '}
        <Link to={`/desk/compounds/${compound.id}`}>Bring in a lab file</Link> first.
      </p>
    );
  }
  const fitted =
    run?.outcomes.flatMap((o) =>
      'result' in o ? [{ label: o.label, model: o.result.model }] : [],
    ) ?? [];
  return (
    <>
      <FitSetup
        testSets={compound.testSets}
        choices={choices}
        busy={busy}
        onFit={(request) => void fit(request)}
      />
      {run && (
        <>
          <FitPlots data={run.request.data} fits={fitted} />
          <h2>Constants and fit quality</h2>
          <FitTable outcomes={run.outcomes} />
          <h2>Material stability</h2>
          <StabilityTable outcomes={run.outcomes} />
          <FitActions
            outcomes={run.outcomes}
            fitFor={(outcome) => ({
              model: outcome.result.model,
              testSetIds: run.request.testSets.map((s) => s.id),
              objective: run.request.objective,
              ...(Object.keys(run.request.weights).length ? { weights: run.request.weights } : {}),
            })}
            onSave={(fit, publishNote) => save.mutateAsync({ fit, publishNote })}
          />
        </>
      )}
    </>
  );
}

/** Fit one or several models to a compound's tests, compare them, publish the one to use. */
export default function FitPage() {
  const { compoundId } = useParams();
  const compound = useCompound(compoundId);
  return (
    <DeskLayout title="Fit models">
      <QueryState query={compound} what="the compound">
        {(data) => (
          <>
            <div className="desk-row desk-row--between">
              <h1>Fit models · {data.code}</h1>
              <Link className="desk-button" to={`/desk/compounds/${data.id}`}>
                Back to {data.code}
              </Link>
            </div>
            <Workbench compound={data} />
          </>
        )}
      </QueryState>
    </DeskLayout>
  );
}
