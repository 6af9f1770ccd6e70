import type { UseFormRegisterReturn } from 'react-hook-form';
import type { UnitSystem } from '../../offline/db';
import { unitOf, type QuantityKind } from '../../inspect/units';
import { Field } from '../Field';

interface QuantityFieldProps {
  label: string;
  kind: QuantityKind;
  units: UnitSystem;
  registration: UseFormRegisterReturn;
  problem?: string;
}

/** A measurement typed as a bare number in the person's units, or with any unit spelled out. */
export function QuantityField({ label, kind, units, registration, problem }: QuantityFieldProps) {
  const unit = unitOf(kind, units);
  return (
    <Field label={`${label} (${unit.symbol})`} error={problem}>
      <input
        inputMode="decimal"
        autoComplete="off"
        enterKeyHint="next"
        data-testid={`field-${registration.name}`}
        {...registration}
      />
    </Field>
  );
}
