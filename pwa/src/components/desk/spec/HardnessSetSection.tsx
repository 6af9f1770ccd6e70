import type { SectionProps } from './sectionProps';
import { SpecNumberField } from './SpecNumberField';

/** Durometer spec and the compression-set limit with the condition it is stated at. */
export function HardnessSetSection({ readOnly, ...form }: SectionProps) {
  return (
    <fieldset className="desk-card" disabled={readOnly}>
      <legend>
        <strong>Hardness and compression set</strong>
      </legend>
      <div className="desk-grid desk-grid--4">
        <SpecNumberField {...form} name="hardnessNominal" label="Hardness nominal" unit="Shore A" />
        <SpecNumberField
          {...form}
          name="hardnessTolerance"
          label="Hardness ±"
          unit="points"
          hint="±5 is the usual call-out"
        />
        <SpecNumberField
          {...form}
          name="setLimitPercent"
          label="Compression set at most"
          unit="%"
        />
        <SpecNumberField {...form} name="setTemperatureC" label="Set test temperature" unit="°C" />
        <SpecNumberField
          {...form}
          name="setHours"
          label="Set test time"
          unit="h"
          hint="e.g. 22 h or 70 h"
        />
      </div>
    </fieldset>
  );
}
