import Papa from 'papaparse';
import type { Mode } from '../../../engine';
import { STRESS_UNITS, type StressUnit } from '../units';

export const MODES: readonly Mode[] = ['uniaxial', 'equibiaxial', 'planar'];

/** How the deformation column is written in the lab's file. */
export type StrainMeasure = 'stretch' | 'strain' | 'strain-percent';

export const STRAIN_MEASURES: Record<StrainMeasure, string> = {
  stretch: 'stretch λ (1 = undeformed)',
  strain: 'engineering strain (0 = undeformed)',
  'strain-percent': 'engineering strain in %',
};

export interface CsvRow {
  /** Line in the file, counting the header, as a spreadsheet shows it. */
  line: number;
  cells: string[];
}

export interface CsvTable {
  headers: string[];
  hasHeader: boolean;
  rows: CsvRow[];
  /** Papaparse's own complaints (e.g. an unclosed quote), by line. */
  problems: { line: number; reason: string }[];
}

export interface ColumnMapping {
  strainColumn: number;
  strainMeasure: StrainMeasure;
  stressColumn: number;
  stressUnit: StressUnit;
  /** Either one mode for the whole file, or a column that names the mode on each row. */
  mode: { column: number } | { fixed: Mode };
}

export interface ImportedPoint {
  line: number;
  mode: Mode;
  stretch: number;
  /** Nominal stress, MPa. */
  stress: number;
}

export interface RejectedRow {
  line: number;
  reason: string;
}

export interface ImportResult {
  accepted: ImportedPoint[];
  rejected: RejectedRow[];
}

/** Stretches beyond this are far past break for any rubber: almost always a wrong column or measure. */
const MAX_STRETCH = 20;

/** A number as labs write it: "1.25", " 1,25 " (decimal comma) or "1.2e-3"; null otherwise. */
export function parseLabNumber(text: string): number | null {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  const normalised = /^[+-]?\d+,\d+$/.test(trimmed) ? trimmed.replace(',', '.') : trimmed;
  if (!/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(normalised)) return null;
  const value = Number(normalised);
  return Number.isFinite(value) ? value : null;
}

function isBlank(cells: string[]): boolean {
  return cells.every((cell) => cell.trim() === '');
}

/**
 * Spreadsheets in decimal-comma locales write semicolon- or tab-separated files, so a first line
 * with either of those uses it and its commas are decimal commas; otherwise it is a comma file.
 */
function delimiterOf(text: string): string {
  const firstLine = text.split(/\r?\n/).find((line) => line.trim() !== '') ?? '';
  return ['\t', ';', '|'].find((d) => firstLine.includes(d)) ?? ',';
}

/** Reads a CSV (comma, semicolon or tab) into cells, keeping every row's line number. */
export function readCsvTable(text: string): CsvTable {
  const clean = text.replace(/^\uFEFF/, '');
  const parsed = Papa.parse<string[]>(clean, {
    header: false,
    skipEmptyLines: false,
    delimiter: delimiterOf(clean),
  });
  const all = parsed.data.map((cells, index) => ({ line: index + 1, cells }));
  const filled = all.filter((row) => !isBlank(row.cells));
  const first = filled[0];
  const hasHeader =
    first !== undefined &&
    first.cells.some((cell) => cell.trim() !== '' && parseLabNumber(cell) === null);
  const width = Math.max(0, ...filled.map((row) => row.cells.length));
  const headers = Array.from({ length: width }, (_, i) =>
    hasHeader ? (first?.cells[i]?.trim() ?? '') || `Column ${i + 1}` : `Column ${i + 1}`,
  );
  return {
    headers,
    hasHeader,
    rows: hasHeader ? filled.slice(1) : filled,
    problems: parsed.errors.map((error) => ({
      line: (error.row ?? 0) + 1,
      reason: error.message,
    })),
  };
}

const MODE_WORDS: Record<Mode, RegExp> = {
  uniaxial: /^(uniaxial|uni|ut|tension|simple tension|uniaxial tension)$/i,
  equibiaxial: /^(equibiaxial|equi-biaxial|biaxial|eb|bt|equibiaxial tension)$/i,
  planar: /^(planar|planar tension|pure shear|ps|pt|shear)$/i,
};

/** The mode a lab wrote on a row, in any of the usual spellings. */
export function modeFromText(text: string): Mode | null {
  const word = text.trim();
  return MODES.find((mode) => MODE_WORDS[mode].test(word)) ?? null;
}

function unitInHeader(header: string): StressUnit | null {
  const compact = header.replace(/\s/g, '').toLowerCase();
  if (compact.includes('kgf/cm')) return 'kgf/cm²';
  if (compact.includes('kpa')) return 'kPa';
  if (compact.includes('mpa') || compact.includes('n/mm')) return 'MPa';
  if (compact.includes('psi')) return 'psi';
  if (/\bpa\b|\(pa\)|_pa$/.test(header.toLowerCase())) return 'Pa';
  return null;
}

/** A first guess at the mapping from the header words; the engineer corrects it in the preview. */
export function guessMapping(table: CsvTable): ColumnMapping {
  const lower = table.headers.map((h) => h.toLowerCase());
  const find = (pattern: RegExp) => lower.findIndex((h) => pattern.test(h));
  const stretchAt = find(/stretch|lambda|λ/);
  const strainAt = find(/strain|elong/);
  const strainColumn = stretchAt >= 0 ? stretchAt : strainAt >= 0 ? strainAt : 0;
  const strainHeader = lower[strainColumn] ?? '';
  const strainMeasure: StrainMeasure =
    stretchAt >= 0
      ? 'stretch'
      : strainAt >= 0
        ? strainHeader.includes('%')
          ? 'strain-percent'
          : 'strain'
        : 'stretch';
  const stressAt = find(/stress|mpa|kpa|psi|force|load/);
  const stressColumn = stressAt >= 0 ? stressAt : strainColumn === 0 ? 1 : 0;
  const modeAt = find(/mode|test|type|deformation/);
  return {
    strainColumn,
    strainMeasure,
    stressColumn,
    stressUnit: unitInHeader(table.headers[stressColumn] ?? '') ?? 'MPa',
    mode: modeAt >= 0 ? { column: modeAt } : { fixed: 'uniaxial' },
  };
}

function toStretch(value: number, measure: StrainMeasure): number {
  if (measure === 'strain') return 1 + value;
  if (measure === 'strain-percent') return 1 + value / 100;
  return value;
}

/** Why a row cannot be a test point, or null when it can. */
function checkRow(row: CsvRow, mapping: ColumnMapping): ImportedPoint | string {
  const strainText = row.cells[mapping.strainColumn] ?? '';
  const stressText = row.cells[mapping.stressColumn] ?? '';
  let mode: Mode;
  if ('fixed' in mapping.mode) {
    mode = mapping.mode.fixed;
  } else {
    const modeText = row.cells[mapping.mode.column] ?? '';
    const found = modeFromText(modeText);
    if (!found) {
      return modeText.trim() === ''
        ? 'no test mode given'
        : `test mode "${modeText.trim()}" is not uniaxial, equibiaxial or planar`;
    }
    mode = found;
  }
  if (strainText.trim() === '') return 'no strain value';
  if (stressText.trim() === '') return 'no stress value';
  const raw = parseLabNumber(strainText);
  if (raw === null) return `strain "${strainText.trim()}" is not a number`;
  const rawStress = parseLabNumber(stressText);
  if (rawStress === null) return `stress "${stressText.trim()}" is not a number`;
  const stretch = toStretch(raw, mapping.strainMeasure);
  if (!(stretch > 0)) return `stretch ${fmt(stretch)} is not above 0 (the specimen cannot vanish)`;
  if (stretch > MAX_STRETCH) {
    return `stretch ${fmt(stretch)} is beyond ${MAX_STRETCH}: check the strain column and measure`;
  }
  const stress = rawStress * STRESS_UNITS[mapping.stressUnit].toMPa;
  // Nominal stress follows the sign of the deformation: a tensile stretch with a compressive stress
  // (or the reverse) is a sign slip or a swapped column, never a material response.
  if ((stretch > 1 && stress < 0) || (stretch < 1 && stress > 0)) {
    return `stress ${fmt(rawStress)} ${mapping.stressUnit} has the wrong sign for stretch ${fmt(stretch)}`;
  }
  return { line: row.line, mode, stretch, stress };
}

function fmt(value: number): string {
  return Number(value.toPrecision(6)).toString();
}

/** Applies the mapping to every row: good rows become points (stress in MPa), bad rows say why. */
export function applyMapping(table: CsvTable, mapping: ColumnMapping): ImportResult {
  const accepted: ImportedPoint[] = [];
  const rejected: RejectedRow[] = table.problems.map((p) => ({ ...p }));
  for (const row of table.rows) {
    const checked = checkRow(row, mapping);
    if (typeof checked === 'string') rejected.push({ line: row.line, reason: checked });
    else accepted.push(checked);
  }
  rejected.sort((a, b) => a.line - b.line);
  return { accepted, rejected };
}

/** Accepted points grouped into one test set per mode, sorted by stretch. */
export function pointsByMode(
  points: readonly ImportedPoint[],
): Partial<Record<Mode, ImportedPoint[]>> {
  const groups: Partial<Record<Mode, ImportedPoint[]>> = {};
  for (const point of points) (groups[point.mode] ??= []).push(point);
  for (const group of Object.values(groups)) group.sort((a, b) => a.stretch - b.stretch);
  return groups;
}
