import { useId } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useMeasurements, usePresses } from '../../api/desk/lots';
import { useSpec, useSpecs } from '../../api/desk/specs';
import { DeskSelect } from '../../components/desk/DeskField';
import { DeskLayout } from '../../components/desk/DeskLayout';
import { QueryState } from '../../components/desk/QueryState';
import { CHARACTERISTICS, type Characteristic } from '../../components/desk/trends/subgroups';
import { TrendCharts } from '../../components/desk/trends/TrendCharts';

const CAVITY_CHOICES = Array.from({ length: 16 }, (_, i) => i + 1);

/** Control charts and capability per characteristic, by part, press and cavity. */
export default function TrendsPage() {
  const id = useId();
  const [params, setParams] = useSearchParams();
  const specId = params.get('spec') ?? undefined;
  const characteristic = (params.get('of') as Characteristic | null) ?? 'load';
  const pressId = params.get('press') ?? undefined;
  const cavity = params.get('cavity') ? Number(params.get('cavity')) : undefined;
  const from = params.get('from') ?? undefined;
  const to = params.get('to') ?? undefined;
  const specs = useSpecs();
  const spec = useSpec(specId);
  const presses = usePresses();
  const measurements = useMeasurements(specId, { pressId, cavity, from, to });

  const set = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next, { replace: true });
  };

  const select = (key: string, label: string, value: string, options: [string, string][]) => (
    <DeskSelect label={label} value={value} options={options} onChange={(v) => set(key, v)} />
  );

  return (
    <DeskLayout title="Trends">
      <h1>Trends and capability</h1>
      <div className="desk-grid desk-grid--4">
        {select('spec', 'Part', specId ?? '', [
          ['', 'choose a part'],
          ...(specs.data ?? []).map((s): [string, string] => [s.id, `${s.partNumber} · ${s.name}`]),
        ])}
        {select(
          'of',
          'Characteristic',
          characteristic,
          Object.entries(CHARACTERISTICS).map(([key, c]): [string, string] => [key, c.label]),
        )}
        {select('press', 'Press', pressId ?? '', [
          ['', 'all presses'],
          ...(presses.data ?? []).map((p): [string, string] => [p.id, `${p.code} · ${p.name}`]),
        ])}
        {select('cavity', 'Cavity', cavity ? String(cavity) : '', [
          ['', 'all cavities'],
          ...CAVITY_CHOICES.map((c): [string, string] => [String(c), `cavity ${c}`]),
        ])}
        <div className="desk-field">
          <label htmlFor={`${id}-from`}>molded from</label>
          <input
            id={`${id}-from`}
            type="date"
            value={from ?? ''}
            onChange={(e) => set('from', e.target.value)}
          />
        </div>
        <div className="desk-field">
          <label htmlFor={`${id}-to`}>molded up to</label>
          <input
            id={`${id}-to`}
            type="date"
            value={to ?? ''}
            onChange={(e) => set('to', e.target.value)}
          />
        </div>
      </div>
      {specId ? (
        <QueryState query={measurements} what="the measurements">
          {(rows) => (
            <TrendCharts
              rows={rows}
              characteristic={characteristic}
              revision={spec.data?.currentRevision ?? null}
            />
          )}
        </QueryState>
      ) : (
        <p className="desk-muted">Choose a part to see its charts.</p>
      )}
    </DeskLayout>
  );
}
