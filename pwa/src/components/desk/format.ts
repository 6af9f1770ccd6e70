/** Numbers for engineers: four significant digits, no float noise, an en dash for nothing. */
export function formatNumber(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '–';
  if (value !== 0 && (Math.abs(value) < 1e-3 || Math.abs(value) >= 1e6))
    return value.toExponential(digits - 1);
  return Number(value.toPrecision(digits)).toString();
}

/** A share as a percentage with one decimal. */
export function formatPercent(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value)
    ? '–'
    : `${value.toFixed(1)} %`;
}

export function formatDate(iso: string | null | undefined): string {
  if (!iso) return '–';
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '–' : date.toISOString().slice(0, 16).replace('T', ' ');
}
