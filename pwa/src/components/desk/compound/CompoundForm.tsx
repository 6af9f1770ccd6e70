import { useId, useState, type ReactNode } from 'react';
import { POLYMERS, type NewCompound, type Polymer } from '../../../api/desk/types';
import { useSubmission } from '../useSubmission';
import { ErrorAlert } from '../ErrorAlert';

interface Props {
  initial?: Partial<NewCompound>;
  /** The code names the compound in every record, so it is set once and never edited. */
  codeFixed?: boolean;
  submitLabel: string;
  onSubmit(compound: NewCompound): Promise<unknown>;
  onCancel?(): void;
}

interface Fields {
  code: string;
  name: string;
  polymer: Polymer;
  hardness: string;
  bulk: string;
  notes: string;
}

function problems(f: Fields): Partial<Record<keyof Fields, string>> {
  const found: Partial<Record<keyof Fields, string>> = {};
  if (!f.code.trim()) found.code = 'give the compound a code';
  if (!f.name.trim()) found.name = 'give the compound a name';
  const hardness = Number(f.hardness);
  if (!(f.hardness.trim() && hardness >= 10 && hardness <= 95))
    found.hardness = 'Shore A between 10 and 95';
  const bulk = Number(f.bulk);
  if (f.bulk.trim() && !(bulk >= 1 && bulk <= 10_000))
    found.bulk = 'between 1 and 10 000 MPa, or empty';
  return found;
}

/** A compound's identity: code, family, nominal hardness, bulk modulus and notes. */
export function CompoundForm({ initial = {}, codeFixed, submitLabel, onSubmit, onCancel }: Props) {
  const id = useId();
  const [fields, setFields] = useState<Fields>({
    code: initial.code ?? '',
    name: initial.name ?? '',
    polymer: initial.polymer ?? 'NR',
    hardness: initial.hardnessShoreA === undefined ? '' : String(initial.hardnessShoreA),
    bulk: initial.bulkModulusMPa === undefined ? '' : String(initial.bulkModulusMPa),
    notes: initial.notes ?? '',
  });
  const { busy, error, submit } = useSubmission();
  const found = problems(fields);
  const set = (patch: Partial<Fields>) => setFields({ ...fields, ...patch });

  const compound = (): NewCompound => ({
    code: fields.code.trim(),
    name: fields.name.trim(),
    polymer: fields.polymer,
    hardnessShoreA: Number(fields.hardness),
    ...(fields.bulk.trim() ? { bulkModulusMPa: Number(fields.bulk) } : {}),
    ...(fields.notes.trim() ? { notes: fields.notes.trim() } : {}),
  });

  const field = (key: keyof Fields, label: string, input: ReactNode) => (
    <div className="desk-field">
      <label htmlFor={`${id}-${key}`}>{label}</label>
      {input}
      {found[key] && fields[key] !== '' && <span className="desk-muted">{found[key]}</span>}
    </div>
  );

  return (
    <form
      className="desk-card"
      onSubmit={(event) => {
        event.preventDefault();
        void submit(() => onSubmit(compound()));
      }}
    >
      <div className="desk-grid desk-grid--4">
        {field(
          'code',
          'Code',
          <input
            id={`${id}-code`}
            value={fields.code}
            disabled={codeFixed}
            onChange={(e) => set({ code: e.target.value })}
          />,
        )}
        {field(
          'name',
          'Name',
          <input
            id={`${id}-name`}
            value={fields.name}
            onChange={(e) => set({ name: e.target.value })}
          />,
        )}
        {field(
          'polymer',
          'Polymer family',
          <select
            id={`${id}-polymer`}
            value={fields.polymer}
            onChange={(e) => set({ polymer: e.target.value as Polymer })}
          >
            {POLYMERS.map((p) => (
              <option key={p}>{p}</option>
            ))}
          </select>,
        )}
        {field(
          'hardness',
          'Nominal hardness, Shore A',
          <input
            id={`${id}-hardness`}
            inputMode="decimal"
            value={fields.hardness}
            aria-invalid={!!found.hardness && fields.hardness !== ''}
            onChange={(e) => set({ hardness: e.target.value })}
          />,
        )}
        {field(
          'bulk',
          'Bulk modulus K, MPa (optional)',
          <input
            id={`${id}-bulk`}
            inputMode="decimal"
            value={fields.bulk}
            aria-invalid={!!found.bulk}
            placeholder="e.g. 2000"
            onChange={(e) => set({ bulk: e.target.value })}
          />,
        )}
      </div>
      {field(
        'notes',
        'Notes',
        <textarea
          id={`${id}-notes`}
          rows={2}
          value={fields.notes}
          onChange={(e) => set({ notes: e.target.value })}
        />,
      )}
      {error && <ErrorAlert>{error}</ErrorAlert>}
      <div className="desk-actions">
        <button
          type="submit"
          className="desk-primary"
          disabled={busy || Object.keys(found).length > 0}
        >
          {submitLabel}
        </button>
        {onCancel && (
          <button type="button" onClick={onCancel}>
            Cancel
          </button>
        )}
      </div>
    </form>
  );
}
