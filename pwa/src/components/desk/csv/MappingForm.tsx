import { useId } from 'react';
import type { Mode } from '../../../engine';
import { STRESS_UNITS, STRESS_UNIT_NAMES, type StressUnit } from '../units';
import { MODES, STRAIN_MEASURES, type ColumnMapping, type StrainMeasure } from './stressStrainCsv';

interface Props {
  headers: string[];
  mapping: ColumnMapping;
  onChange(mapping: ColumnMapping): void;
}

const FROM_COLUMN = 'column';

/** Which column holds what, in which unit: the engineer's correction of our guess. */
export function MappingForm({ headers, mapping, onChange }: Props) {
  const id = useId();
  const columnOptions = headers.map((header, index) => (
    <option key={index} value={index}>
      {header}
    </option>
  ));
  const modeValue = 'fixed' in mapping.mode ? mapping.mode.fixed : FROM_COLUMN;

  return (
    <fieldset className="desk-grid desk-grid--4">
      <legend>Columns and units</legend>
      <div className="desk-field">
        <label htmlFor={`${id}-strain`}>Deformation column</label>
        <select
          id={`${id}-strain`}
          value={mapping.strainColumn}
          onChange={(e) => onChange({ ...mapping, strainColumn: Number(e.target.value) })}
        >
          {columnOptions}
        </select>
      </div>
      <div className="desk-field">
        <label htmlFor={`${id}-measure`}>Deformation is written as</label>
        <select
          id={`${id}-measure`}
          value={mapping.strainMeasure}
          onChange={(e) => onChange({ ...mapping, strainMeasure: e.target.value as StrainMeasure })}
        >
          {Object.entries(STRAIN_MEASURES).map(([value, label]) => (
            <option key={value} value={value}>
              {label}
            </option>
          ))}
        </select>
      </div>
      <div className="desk-field">
        <label htmlFor={`${id}-stress`}>Nominal stress column</label>
        <select
          id={`${id}-stress`}
          value={mapping.stressColumn}
          onChange={(e) => onChange({ ...mapping, stressColumn: Number(e.target.value) })}
        >
          {columnOptions}
        </select>
      </div>
      <div className="desk-field">
        <label htmlFor={`${id}-unit`}>Stress unit</label>
        <select
          id={`${id}-unit`}
          value={mapping.stressUnit}
          onChange={(e) => onChange({ ...mapping, stressUnit: e.target.value as StressUnit })}
        >
          {STRESS_UNIT_NAMES.map((unit) => (
            <option key={unit} value={unit}>
              {STRESS_UNITS[unit].label}
            </option>
          ))}
        </select>
      </div>
      <div className="desk-field">
        <label htmlFor={`${id}-mode`}>Test mode</label>
        <select
          id={`${id}-mode`}
          value={modeValue}
          onChange={(e) =>
            onChange({
              ...mapping,
              mode:
                e.target.value === FROM_COLUMN
                  ? { column: 'column' in mapping.mode ? mapping.mode.column : 0 }
                  : { fixed: e.target.value as Mode },
            })
          }
        >
          <option value={FROM_COLUMN}>named on each row</option>
          {MODES.map((mode) => (
            <option key={mode} value={mode}>
              all rows {mode}
            </option>
          ))}
        </select>
      </div>
      {'column' in mapping.mode && (
        <div className="desk-field">
          <label htmlFor={`${id}-modecol`}>Mode column</label>
          <select
            id={`${id}-modecol`}
            value={mapping.mode.column}
            onChange={(e) => onChange({ ...mapping, mode: { column: Number(e.target.value) } })}
          >
            {columnOptions}
          </select>
        </div>
      )}
    </fieldset>
  );
}
