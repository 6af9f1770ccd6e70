import type { CompoundRecord } from '../../../api/desk/types';
import { DeskSelect } from '../DeskField';
import type { SectionProps } from './sectionProps';
import { SpecNumberField } from './SpecNumberField';

interface Props extends SectionProps {
  compounds: CompoundRecord[];
}

/** Which compound, and the load test the inspector runs on every sampled part. */
export function LoadTestSection({ readOnly, compounds, ...form }: Props) {
  const { fields, problems, onChange } = form;
  const compound = compounds.find((c) => c.id === fields.compoundId);
  return (
    <fieldset className="desk-card" disabled={readOnly}>
      <legend>
        <strong>Compound and load test</strong>
      </legend>
      <div className="desk-grid desk-grid--4">
        <DeskSelect
          label="Compound"
          value={fields.compoundId}
          onChange={(compoundId) => {
            // The spec's nominal hardness is the one the compound's constants were fitted at.
            const chosen = compounds.find((c) => c.id === compoundId);
            onChange({
              compoundId,
              ...(chosen ? { hardnessNominal: String(chosen.hardnessShoreA) } : {}),
            });
          }}
          options={[
            ['', 'choose a compound'],
            ...compounds.map((c): [string, string] => [
              c.id,
              `${c.code} · ${c.name}${c.currentFit ? ` (v${c.currentFit.version})` : ' (no constants yet)'}`,
            ]),
          ]}
        />
        <SpecNumberField {...form} name="testDeflection" label="Test deflection" unit="mm" />
        <SpecNumberField {...form} name="loadTolerancePercent" label="Load tolerance ±" unit="%" />
      </div>
      {problems.compoundId && <span className="desk-problem">{problems.compoundId}</span>}
      {compound && !compound.currentFit && (
        <p className="desk-callout desk-callout--warn">
          {compound.code} has no published constants, so there is no expected load yet. Publish a
          fit on the compound first.
        </p>
      )}
    </fieldset>
  );
}
