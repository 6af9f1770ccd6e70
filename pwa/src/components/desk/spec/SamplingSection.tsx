import { useState } from 'react';
import { PREFERRED_AQLS, type InspectionLevel, type InspectionSeverity } from '../../../engine';
import { DeskNumberField, DeskSelect } from '../DeskField';
import type { SectionProps } from './sectionProps';
import { planFor } from './specDerived';
import type { DeskSpecBody } from '../../../api/desk/types';

const LEVELS: readonly (readonly [InspectionLevel, string])[] = [
  ['I', 'I (fewer parts)'],
  ['II', 'II (general)'],
  ['III', 'III (more parts)'],
];
const SEVERITIES: readonly (readonly [InspectionSeverity, string])[] = [
  ['normal', 'normal'],
  ['tightened', 'tightened'],
  ['reduced', 'reduced'],
];

/** ISO 2859-1 plan settings, with the plan a lot of a chosen size would get. */
export function SamplingSection({
  fields,
  onChange,
  readOnly,
  body,
}: SectionProps & { body: DeskSpecBody | null }) {
  const [lotSize, setLotSize] = useState('500');
  const plan = body ? planFor(body, Number(lotSize)) : null;
  return (
    <section className="desk-card" aria-label="Sampling">
      <strong>Sampling (ISO 2859-1, single sampling)</strong>
      <fieldset className="desk-grid desk-grid--4 desk-bare" disabled={readOnly}>
        <DeskSelect
          label="Inspection level"
          value={fields.level}
          options={LEVELS}
          onChange={(level) => onChange({ level })}
        />
        <DeskSelect
          label="AQL, % nonconforming"
          value={fields.aql}
          options={PREFERRED_AQLS.map((aql): [string, string] => [String(aql), String(aql)])}
          onChange={(aql) => onChange({ aql })}
        />
        <DeskSelect
          label="Severity"
          value={fields.severity}
          options={SEVERITIES}
          onChange={(severity) => onChange({ severity })}
        />
      </fieldset>
      <div className="desk-row desk-row--wrap">
        <DeskNumberField label="For a lot of" unit="parts" value={lotSize} onChange={setLotSize} />
        {plan &&
          ('error' in plan ? (
            <span className="desk-problem">{plan.error}</span>
          ) : (
            <p data-testid="plan-preview">
              code letter {plan.value.codeLetter} → sample <strong>{plan.value.sampleSize}</strong>,
              accept {plan.value.accept}, reject {plan.value.reject}
              {plan.value.inspectAll ? ' (every part)' : ''}
            </p>
          ))}
      </div>
    </section>
  );
}
