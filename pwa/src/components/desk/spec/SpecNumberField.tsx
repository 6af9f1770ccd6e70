import type { DimensionName } from '../../../api/desk/types';
import { DeskNumberField } from '../DeskField';
import type { SectionProps } from './sectionProps';
import type { FieldName } from './specForm';

/** The spec's single typed numbers (dimensions live in their own record, keyed by shape). */
export type SpecNumberName = Exclude<FieldName, DimensionName | 'compoundId'>;

interface Props extends Pick<SectionProps, 'fields' | 'problems' | 'onChange'> {
  name: SpecNumberName;
  label: string;
  unit?: string;
  hint?: string;
}

/** One of the spec's numbers as a desk field, wired to its value and problem by name. */
export function SpecNumberField({ name, fields, problems, onChange, ...shown }: Props) {
  return (
    <DeskNumberField
      {...shown}
      value={fields[name]}
      problem={problems[name]}
      onChange={(value) => onChange({ [name]: value })}
    />
  );
}
