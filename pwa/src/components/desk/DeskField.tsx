import { useId, type ReactNode } from 'react';

interface Props {
  label: string;
  value: string;
  onChange(value: string): void;
  problem?: string;
  unit?: string;
  disabled?: boolean;
  hint?: ReactNode;
}

/** A labelled number as typed, with its problem right under it (the desk's dense form row). */
export function DeskNumberField({ label, value, onChange, problem, unit, disabled, hint }: Props) {
  const id = useId();
  return (
    <div className="desk-field">
      <label htmlFor={id}>
        {label}
        {unit ? `, ${unit}` : ''}
      </label>
      <input
        id={id}
        inputMode="decimal"
        value={value}
        disabled={disabled}
        aria-invalid={!!problem}
        aria-describedby={problem ? `${id}-problem` : undefined}
        onChange={(e) => onChange(e.target.value)}
      />
      {problem && (
        <span id={`${id}-problem`} className="desk-problem">
          {problem}
        </span>
      )}
      {hint && <span className="desk-muted">{hint}</span>}
    </div>
  );
}

interface SelectProps<T extends string> {
  label: string;
  value: T;
  options: readonly (readonly [T, string])[];
  onChange(value: T): void;
  disabled?: boolean;
  /** Inside a table the column heading says what it is; the label stays for screen readers. */
  hideLabel?: boolean;
}

export function DeskSelect<T extends string>({
  label,
  value,
  options,
  onChange,
  disabled,
  hideLabel,
}: SelectProps<T>) {
  const id = useId();
  return (
    <div className="desk-field">
      <label htmlFor={id} className={hideLabel ? 'desk-visually-hidden' : undefined}>
        {label}
      </label>
      <select
        id={id}
        value={value}
        disabled={disabled}
        onChange={(e) => onChange(e.target.value as T)}
      >
        {options.map(([v, text]) => (
          <option key={v} value={v}>
            {text}
          </option>
        ))}
      </select>
    </div>
  );
}
