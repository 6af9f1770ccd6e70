import { useParams } from 'react-router-dom';
import { useCompound } from '../../api/desk/compounds';
import type { CompoundDetail, FitRecord } from '../../api/desk/types';
import { DeskLayout } from '../../components/desk/DeskLayout';
import type { FitOutcome } from '../../components/desk/fit/fitJob';
import { FitPlots } from '../../components/desk/fit/FitPlots';
import { FitTable } from '../../components/desk/fit/FitTable';
import { StabilityTable } from '../../components/desk/fit/StabilityTable';
import { formatDate } from '../../components/desk/format';
import { modelLabel } from '../../components/desk/modelNames';
import { QueryState } from '../../components/desk/QueryState';
import { initialShearModulus, type FitResult } from '../../engine';

/** A stored fit as the engine's result, with μ₀ and E₀ worked out where the server left them out. */
function outcomeOf(fit: FitRecord): FitOutcome {
  const mu0 = fit.result.mu0 ?? initialShearModulus(fit.model);
  const result = {
    ...fit.result,
    model: fit.model,
    mu0,
    e0: fit.result.e0 ?? 3 * mu0,
  } as FitResult;
  return { label: `v${fit.version} ${modelLabel(fit.model)}`, result };
}

function Report({ compound, fit }: { compound: CompoundDetail; fit: FitRecord }) {
  const sets = compound.testSets.filter((s) => fit.testSetIds.includes(s.id));
  const data = sets.flatMap((s) =>
    s.points.map((p) => ({ mode: s.mode, stretch: p.stretch, stress: p.stress })),
  );
  const outcome = outcomeOf(fit);
  const weights = Object.entries(fit.weights ?? {});
  return (
    <article className="desk-card" aria-label="Fit report">
      <div className="desk-row desk-row--between">
        <h1>
          Fit report · {compound.code} constants v{fit.version}
        </h1>
        <button type="button" className="desk-noprint" onClick={() => window.print()}>
          Print or save as PDF
        </button>
      </div>
      <p>
        {compound.name} ({compound.polymer}, nominal {compound.hardnessShoreA} Shore A). Model{' '}
        {modelLabel(fit.model)}, {fit.objective} objective
        {weights.length
          ? `, weights ${weights.map(([m, w]) => `${m} ${w}`).join(', ')}`
          : ', every point weighed alike'}
        .{' '}
        {fit.status === 'published'
          ? `Published ${formatDate(fit.publishedAt)}`
          : 'Draft, not published'}
        {fit.id === compound.currentFitId ? ' — the constants in use.' : '.'}
      </p>
      {fit.note && <p className="desk-callout">{fit.note}</p>}
      <h2>Test data</h2>
      <ul>
        {sets.map((s) => (
          <li key={s.id}>
            {s.name}: {s.mode}, {s.points.length} points
            {s.temperatureC === undefined || s.temperatureC === null
              ? ''
              : ` at ${s.temperatureC} °C`}
          </li>
        ))}
      </ul>
      <h2>Constants and fit quality</h2>
      <FitTable outcomes={[outcome]} />
      <FitPlots
        data={data}
        fits={'result' in outcome ? [{ label: outcome.label, model: fit.model }] : []}
      />
      {fit.result.stability && (
        <>
          <h2>Material stability</h2>
          <StabilityTable outcomes={[outcome]} />
        </>
      )}
      <p className="desk-muted">
        Constants fitted to these tests describe this compound in these modes and stretch ranges;
        beyond them a model may differ from the rubber. Part loads worked out from them are
        estimates: acceptance follows the customer's drawing and the applicable standards, and
        safety-critical parts need a qualified engineer's sign-off.
      </p>
    </article>
  );
}

/** One stored fit of a compound, laid out to print or hand to a customer. */
export default function FitReportPage() {
  const { compoundId, fitId } = useParams();
  const compound = useCompound(compoundId);
  return (
    <DeskLayout title="Fit report">
      <QueryState query={compound} what="the compound">
        {(data) => {
          const fit = data.fits.find((f) => f.id === fitId);
          return fit ? (
            <Report compound={data} fit={fit} />
          ) : (
            <p className="desk-problem">No such fit on {data.code}.</p>
          );
        }}
      </QueryState>
    </DeskLayout>
  );
}
