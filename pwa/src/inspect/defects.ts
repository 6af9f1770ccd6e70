import type { DefectLocation, DefectSeverity } from '../api/types';

/** Visual defects of molded rubber in the trade's words (REFERENCES §11); values as the server takes them. */
export const DEFECT_TYPES = [
  { value: 'flash', label: 'Flash' },
  { value: 'off-register', label: 'Off-register (mismatch)' },
  { value: 'backrind', label: 'Backrind' },
  { value: 'non-fill', label: 'Non-fill' },
  { value: 'flow-line', label: 'Flow lines' },
  { value: 'knit-line', label: 'Knit lines' },
  { value: 'void', label: 'Voids or porosity' },
  { value: 'blister', label: 'Blisters' },
  { value: 'contamination', label: 'Contamination or inclusion' },
  { value: 'mold-deposit', label: 'Mold deposit marks' },
  { value: 'trim-damage', label: 'Trim damage' },
  { value: 'scorch', label: 'Scorch' },
  { value: 'under-cure', label: 'Under-cure' },
  { value: 'over-cure', label: 'Over-cure' },
  { value: 'bond-failure', label: 'Bond failure' },
  { value: 'ozone-crack', label: 'Ozone cracks' },
  { value: 'other', label: 'Other (say what in the note)' },
] as const;

/** Classed by what the surface does in service, not by a fixed pass/fail. */
export const LOCATIONS: { value: DefectLocation; label: string }[] = [
  { value: 'sealing', label: 'Sealing surface' },
  { value: 'flexing', label: 'Flexing area' },
  { value: 'protecting', label: 'Protective surface' },
  { value: 'cosmetic', label: 'Cosmetic only' },
];

export const SEVERITIES: { value: DefectSeverity; label: string; note: string }[] = [
  { value: 'critical', label: 'Critical', note: 'part is bad; safety or function at risk' },
  { value: 'major', label: 'Major', note: 'part is bad' },
  { value: 'minor', label: 'Minor', note: 'noted, part still counts as good' },
];

export function defectLabel(type: string): string {
  return DEFECT_TYPES.find((t) => t.value === type)?.label ?? type;
}
