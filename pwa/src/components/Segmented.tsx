import './segmented.css';

interface SegmentedProps<T extends string> {
  label: string;
  value: T;
  options: { value: T; label: string }[];
  onChange(value: T): void;
}

/** A row of large radio buttons; plain HTML keeps heavy components out of the first download. */
export function Segmented<T extends string>({
  label,
  value,
  options,
  onChange,
}: SegmentedProps<T>) {
  return (
    <fieldset className="segmented">
      <legend>{label}</legend>
      {options.map((option) => (
        <label key={option.value} className={option.value === value ? 'segment-on' : undefined}>
          <input
            type="radio"
            name={label}
            value={option.value}
            checked={option.value === value}
            onChange={() => onChange(option.value)}
          />
          {option.label}
        </label>
      ))}
    </fieldset>
  );
}
