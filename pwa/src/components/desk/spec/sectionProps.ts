import type { FieldProblems, SpecFields } from './specForm';

/** What every section of the spec editor gets: the fields, their problems, and a way to change them. */
export interface SectionProps {
  fields: SpecFields;
  problems: FieldProblems;
  onChange(patch: Partial<SpecFields>): void;
  readOnly: boolean;
}
