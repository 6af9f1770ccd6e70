import { useId, useMemo, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useAddAgingSet, useAgingSets } from '../../api/desk/aging';
import { useCompounds } from '../../api/desk/compounds';
import { useSpecs } from '../../api/desk/specs';
import type { AgingSet } from '../../api/desk/types';
import { AgingAnalysis, type SetCondition } from '../../components/desk/aging/AgingAnalysis';
import { AgingTable, rowProblem, type AgingRow } from '../../components/desk/aging/AgingTable';
import { DeskLayout } from '../../components/desk/DeskLayout';
import { engineAnswer } from '../../components/desk/engineAnswer';
import { formatDate } from '../../components/desk/format';
import { arrheniusFit, type AgingPoint } from '../../engine';

const EMPTY_ROWS: AgingRow[] = [
  { temperature: '', hours: '' },
  { temperature: '', hours: '' },
  { temperature: '', hours: '' },
];

function pointsOf(rows: AgingRow[]): AgingPoint[] {
  return rows
    .filter((row) => row.temperature.trim() !== '' && rowProblem(row) === null)
    .map((row) => ({ temperatureC: Number(row.temperature), hours: Number(row.hours) }));
}

/** The set conditions of released specs on this compound, to check the aging data against. */
function useConditions(compoundId: string | undefined) {
  const specs = useSpecs();
  return (specs.data ?? []).flatMap((spec) => {
    const body = spec.currentRevision?.body;
    if (!body || body.compoundId !== compoundId || !body.compressionSetCondition) return [];
    const condition: SetCondition = {
      ...body.compressionSetCondition,
      limitPercent: body.compressionSetLimitPercent,
    };
    return [{ label: `${spec.partNumber} rev ${spec.currentRevision?.revision}`, condition }];
  });
}

function Analysis({
  rows,
  threshold,
  compoundId,
}: {
  rows: AgingRow[];
  threshold: number;
  compoundId?: string;
}) {
  const id = useId();
  const conditions = useConditions(compoundId);
  const [picked, setPicked] = useState(-1);
  const points = useMemo(() => pointsOf(rows), [rows]);
  const fit = engineAnswer(() => arrheniusFit(points));
  if ('error' in fit) {
    return <p className="desk-callout desk-callout--warn">No fit yet — {fit.error}</p>;
  }
  const condition = conditions[picked]?.condition;
  return (
    <>
      {conditions.length > 0 && (
        <div className="desk-field">
          <label htmlFor={`${id}-spec`}>Take the set condition from a part spec</label>
          <select
            id={`${id}-spec`}
            value={picked}
            onChange={(e) => setPicked(Number(e.target.value))}
          >
            <option value={-1}>type it below</option>
            {conditions.map((c, i) => (
              <option key={c.label} value={i}>
                {c.label}: {c.condition.hours} h at {c.condition.temperatureC} °C
              </option>
            ))}
          </select>
        </div>
      )}
      <AgingAnalysis
        key={picked}
        points={points}
        fit={fit.value}
        thresholdPercent={threshold}
        condition={condition}
      />
    </>
  );
}

function SavedSets({ sets, onOpen }: { sets: AgingSet[]; onOpen(set: AgingSet): void }) {
  if (sets.length === 0)
    return <p className="desk-muted">No aging series stored for this compound yet.</p>;
  return (
    <table className="desk-table" aria-label="Stored aging series">
      <thead>
        <tr>
          <th scope="col">series</th>
          <th scope="col">threshold</th>
          <th scope="col">temperatures, °C</th>
          <th scope="col">stored</th>
          <th scope="col" />
        </tr>
      </thead>
      <tbody>
        {sets.map((set) => (
          <tr key={set.id}>
            <td>{set.name}</td>
            <td>{set.thresholdPercent} % set</td>
            <td>{set.points.map((p) => p.temperatureC).join(', ')}</td>
            <td>{formatDate(set.createdAt)}</td>
            <td>
              <button type="button" onClick={() => onOpen(set)}>
                Open
              </button>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Compression-set aging: times to a set threshold at oven temperatures → Arrhenius predictions. */
export default function AgingPage() {
  const id = useId();
  const [params, setParams] = useSearchParams();
  const compoundId = params.get('compound') ?? undefined;
  const compounds = useCompounds();
  const sets = useAgingSets(compoundId);
  const add = useAddAgingSet(compoundId ?? '');
  const [name, setName] = useState('');
  const [threshold, setThreshold] = useState('50');
  const [rows, setRows] = useState<AgingRow[]>(EMPTY_ROWS);
  const thresholdValue = Number(threshold);
  const thresholdOk = thresholdValue > 0 && thresholdValue < 100;
  const points = pointsOf(rows);

  function open(set: AgingSet) {
    setName(set.name);
    setThreshold(String(set.thresholdPercent));
    setRows(
      set.points.map((p) => ({ temperature: String(p.temperatureC), hours: String(p.hours) })),
    );
  }

  return (
    <DeskLayout title="Set and aging">
      <h1>Compression set and aging</h1>
      <div className="desk-field desk-field--narrow">
        <label htmlFor={`${id}-compound`}>Compound</label>
        <select
          id={`${id}-compound`}
          value={compoundId ?? ''}
          onChange={(e) => setParams({ compound: e.target.value })}
        >
          <option value="">choose a compound</option>
          {(compounds.data ?? []).map((c) => (
            <option key={c.id} value={c.id}>
              {c.code} · {c.name}
            </option>
          ))}
        </select>
      </div>
      {compoundId && <SavedSets sets={sets.data ?? []} onOpen={open} />}
      <section className="desk-card" aria-label="Aging data">
        <h3>Oven results</h3>
        <p className="desk-muted">
          Age test pieces at three or more temperatures and enter, for each, the hours until the
          compression set reached the threshold.
        </p>
        <div className="desk-grid desk-grid--4">
          <div className="desk-field">
            <label htmlFor={`${id}-name`}>Series name</label>
            <input id={`${id}-name`} value={name} onChange={(e) => setName(e.target.value)} />
          </div>
          <div className="desk-field">
            <label htmlFor={`${id}-threshold`}>End of life at set, %</label>
            <input
              id={`${id}-threshold`}
              inputMode="decimal"
              value={threshold}
              aria-invalid={!thresholdOk}
              onChange={(e) => setThreshold(e.target.value)}
            />
          </div>
        </div>
        <AgingTable rows={rows} onChange={setRows} />
        {compoundId && (
          <div className="desk-actions">
            <button
              type="button"
              className="desk-primary"
              disabled={!name.trim() || !thresholdOk || points.length < 3 || add.isPending}
              onClick={() =>
                add.mutate({ name: name.trim(), thresholdPercent: thresholdValue, points })
              }
            >
              Store this series with the compound
            </button>
            {add.isError && (
              <span className="desk-callout desk-callout--error">{add.error.message}</span>
            )}
          </div>
        )}
      </section>
      {thresholdOk && <Analysis rows={rows} threshold={thresholdValue} compoundId={compoundId} />}
    </DeskLayout>
  );
}
