import { DeskNumberField } from '../DeskField';
import type { SectionProps } from './sectionProps';

/** Durometer spec and the compression-set limit with the condition it is stated at. */
export function HardnessSetSection({ fields, problems, onChange, readOnly }: SectionProps) {
  return (
    <fieldset className="desk-card" disabled={readOnly}>
      <legend>
        <strong>Hardness and compression set</strong>
      </legend>
      <div className="desk-grid desk-grid--4">
        <DeskNumberField
          label="Hardness nominal"
          unit="Shore A"
          value={fields.hardnessNominal}
          problem={problems.hardnessNominal}
          onChange={(hardnessNominal) => onChange({ hardnessNominal })}
        />
        <DeskNumberField
          label="Hardness ±"
          unit="points"
          value={fields.hardnessTolerance}
          problem={problems.hardnessTolerance}
          hint="±5 is the usual call-out"
          onChange={(hardnessTolerance) => onChange({ hardnessTolerance })}
        />
        <DeskNumberField
          label="Compression set at most"
          unit="%"
          value={fields.setLimitPercent}
          problem={problems.setLimitPercent}
          onChange={(setLimitPercent) => onChange({ setLimitPercent })}
        />
        <DeskNumberField
          label="Set test temperature"
          unit="°C"
          value={fields.setTemperatureC}
          problem={problems.setTemperatureC}
          onChange={(setTemperatureC) => onChange({ setTemperatureC })}
        />
        <DeskNumberField
          label="Set test time"
          unit="h"
          value={fields.setHours}
          problem={problems.setHours}
          hint="e.g. 22 h or 70 h"
          onChange={(setHours) => onChange({ setHours })}
        />
      </div>
    </fieldset>
  );
}
