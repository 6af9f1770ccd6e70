import {
  DEFAULT_BULK_CORRECTION,
  LINDLEY_NATURAL_RUBBER,
  type BulkCorrection,
} from '../../../engine';
import type { CompoundRecord } from '../../../api/desk/types';
import { DeskSelect } from '../DeskField';
import { formatNumber } from '../format';
import type { SectionProps } from './sectionProps';
import { SpecNumberField } from './SpecNumberField';

const CORRECTIONS: Record<BulkCorrection, string> = {
  lubrication: '1/E′ = 1/E + 4/(3K), lubrication theory',
  'gent-lindley': '1/E′ = 1/E + 1/K, Gent & Lindley 1959',
  none: 'none (incompressible)',
};

interface Props extends SectionProps {
  compound: CompoundRecord | undefined;
}

/** The engineering choices behind the expected load, with the defaults named. */
export function MechanicsSection({ readOnly, compound, ...form }: Props) {
  const { fields, onChange } = form;
  const defaults = LINDLEY_NATURAL_RUBBER;
  return (
    <fieldset className="desk-card" disabled={readOnly}>
      <legend>
        <strong>How the load is worked out</strong>
      </legend>
      <div className="desk-grid desk-grid--2">
        <DeskSelect
          label="Bulk compressibility correction"
          value={fields.bulkCorrection}
          onChange={(bulkCorrection) => onChange({ bulkCorrection })}
          options={[
            ['', `default: ${CORRECTIONS[DEFAULT_BULK_CORRECTION]}`],
            ...(Object.entries(CORRECTIONS) as [BulkCorrection, string][]),
          ]}
        />
        <SpecNumberField
          {...form}
          name="materialFactor"
          label="Material factor k (empty: from the hardness table)"
        />
      </div>
      <p className="desk-muted">
        Bulk modulus K:{' '}
        {compound?.bulkModulusMPa
          ? `${formatNumber(compound.bulkModulusMPa)} MPa from the compound`
          : `${formatNumber(defaults.bulkModulus)} MPa, the table's value (the compound gives none)`}
        . Hardness table: {defaults.source}
        {defaults.verified ? '' : ' — not yet checked against the original; treat k as an estimate'}
        .
      </p>
    </fieldset>
  );
}
