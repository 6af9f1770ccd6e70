import { useId, useMemo, useState } from 'react';
import type { NewTestSet } from '../../../api/desk/types';
import { useSubmission } from '../useSubmission';
import { CsvPreview } from './CsvPreview';
import { CsvSource } from './CsvSource';
import { ImportSummary } from './ImportSummary';
import { MappingForm } from './MappingForm';
import {
  applyMapping,
  guessMapping,
  MODES,
  pointsByMode,
  readCsvTable,
  type ColumnMapping,
  type CsvTable,
} from './stressStrainCsv';
import { ErrorAlert } from '../ErrorAlert';

interface Props {
  /** Saves one test set per mode found in the file. */
  onSave(sets: NewTestSet[]): Promise<void>;
}

interface Loaded {
  table: CsvTable;
  mapping: ColumnMapping;
  name: string;
}

/** Lab CSV → checked stress–strain test sets: preview, column mapping, units, rejected rows. */
export function CsvImportPanel({ onSave }: Props) {
  const id = useId();
  const [loaded, setLoaded] = useState<Loaded | null>(null);
  const [temperature, setTemperature] = useState('');
  const { busy: saving, error, submit, clearError } = useSubmission();

  const result = useMemo(
    () => (loaded ? applyMapping(loaded.table, loaded.mapping) : null),
    [loaded],
  );

  function read(text: string, name: string) {
    const table = readCsvTable(text);
    clearError();
    setLoaded({ table, mapping: guessMapping(table), name });
  }

  async function save() {
    if (!loaded || !result) return;
    const temperatureC = temperature.trim() === '' ? undefined : Number(temperature);
    const groups = pointsByMode(result.accepted);
    const sets = MODES.flatMap((mode) => {
      const points = groups[mode];
      if (!points?.length) return [];
      return [
        {
          name: `${loaded.name} — ${mode}`,
          mode,
          ...(temperatureC === undefined ? {} : { temperatureC }),
          points: points.map(({ stretch, stress }) => ({ stretch, stress })),
        },
      ];
    });
    await submit(async () => {
      await onSave(sets);
      setLoaded(null);
    });
  }

  const temperatureBad = temperature.trim() !== '' && !Number.isFinite(Number(temperature));

  return (
    <section className="desk-card" aria-label="Import test data">
      <h3>Bring in test data</h3>
      <CsvSource onText={read} />
      {loaded && result && (
        <>
          <CsvPreview table={loaded.table} />
          <MappingForm
            headers={loaded.table.headers}
            mapping={loaded.mapping}
            onChange={(mapping) => setLoaded({ ...loaded, mapping })}
          />
          <div className="desk-row desk-row--wrap">
            <div className="desk-field">
              <label htmlFor={`${id}-name`}>Name of the test</label>
              <input
                id={`${id}-name`}
                value={loaded.name}
                onChange={(e) => setLoaded({ ...loaded, name: e.target.value })}
              />
            </div>
            <div className="desk-field">
              <label htmlFor={`${id}-temp`}>Test temperature, °C (optional)</label>
              <input
                id={`${id}-temp`}
                inputMode="decimal"
                value={temperature}
                aria-invalid={temperatureBad}
                onChange={(e) => setTemperature(e.target.value)}
              />
            </div>
          </div>
          <ImportSummary result={result} />
          {error && <ErrorAlert>The server did not take the test data: {error}</ErrorAlert>}
          <div className="desk-actions">
            <button
              type="button"
              className="desk-primary"
              disabled={
                saving || result.accepted.length === 0 || !loaded.name.trim() || temperatureBad
              }
              onClick={() => void save()}
            >
              {saving ? 'Saving…' : `Keep ${result.accepted.length} points as test data`}
            </button>
            <button type="button" onClick={() => setLoaded(null)}>
              Discard
            </button>
          </div>
        </>
      )}
    </section>
  );
}
