import type { DimensionName } from '../../../api/desk/types';
import type { DimensionKind, ToleranceClass } from '../../../engine';
import { DeskSelect } from '../DeskField';
import { formatNumber } from '../format';
import type { SectionProps } from './sectionProps';
import { dimensionTolerances } from './specDerived';
import { DIMENSION_LABELS } from './specForm';

const CLASSES: readonly (readonly [ToleranceClass, string])[] = [
  ['M1', 'M1 (precision)'],
  ['M2', 'M2 (high quality)'],
  ['M3', 'M3 (good quality)'],
  ['M4', 'M4 (non-critical)'],
];
const KINDS: readonly (readonly [DimensionKind, string])[] = [
  ['fixed', 'fixed (one mold part)'],
  ['closure', 'closure (across the parting line)'],
];

/** ISO 3302-1 class and kind per molded dimension, with the ± each gives at its nominal size. */
export function ToleranceSection({ fields, onChange, readOnly }: SectionProps) {
  const setDimension = (
    name: DimensionName,
    patch: { class?: ToleranceClass; kind?: DimensionKind },
  ) => {
    const current = fields.dimensionTolerances[name] ?? {
      class: fields.defaultClass,
      kind: 'fixed' as const,
    };
    onChange({
      dimensionTolerances: { ...fields.dimensionTolerances, [name]: { ...current, ...patch } },
    });
  };
  return (
    <fieldset className="desk-card" disabled={readOnly}>
      <legend>
        <strong>Dimensional tolerances (ISO 3302-1)</strong>
      </legend>
      <DeskSelect
        label="Class unless set per dimension"
        value={fields.defaultClass}
        options={CLASSES}
        onChange={(defaultClass) => onChange({ defaultClass })}
      />
      <table className="desk-table desk-table--compact" aria-label="Tolerance per dimension">
        <thead>
          <tr>
            <th scope="col">dimension</th>
            <th scope="col" className="num">
              nominal, mm
            </th>
            <th scope="col">class</th>
            <th scope="col">kind</th>
            <th scope="col" className="num">
              ± mm
            </th>
          </tr>
        </thead>
        <tbody>
          {dimensionTolerances(
            fields.shape,
            Object.fromEntries(
              Object.entries(fields.dimensions).map(([name, value]) => [name, Number(value)]),
            ),
            { class: fields.defaultClass, dimensions: fields.dimensionTolerances },
          ).map(({ name, nominal, tolClass, kind, plusMinus }) => {
            return (
              <tr key={name}>
                <td>{DIMENSION_LABELS[name]}</td>
                <td className="num">{formatNumber(nominal)}</td>
                <td>
                  <DeskSelect
                    label={`class of ${name}`}
                    hideLabel
                    value={tolClass}
                    options={CLASSES}
                    onChange={(c) => setDimension(name, { class: c })}
                  />
                </td>
                <td>
                  <DeskSelect
                    label={`kind of ${name}`}
                    hideLabel
                    value={kind}
                    options={KINDS}
                    onChange={(k) => setDimension(name, { kind: k })}
                  />
                </td>
                <td className="num" data-testid={`tolerance-${name}`}>
                  {'error' in plusMinus ? '–' : `± ${formatNumber(plusMinus.value, 3)}`}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </fieldset>
  );
}
