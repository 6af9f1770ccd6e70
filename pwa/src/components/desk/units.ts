/** Stress units labs report in, with the exact factor to the engine's MPa. */
export const STRESS_UNITS = {
  MPa: { label: 'MPa (N/mm²)', toMPa: 1 },
  kPa: { label: 'kPa', toMPa: 1e-3 },
  Pa: { label: 'Pa', toMPa: 1e-6 },
  // 1 lbf = 4.4482216152605 N and 1 in² = 645.16 mm², both exact by definition.
  psi: { label: 'psi (lbf/in²)', toMPa: 4.4482216152605 / 645.16 },
  // 1 kgf = 9.80665 N exactly; older papers (Treloar 1944, Ogden 1972) use kgf/cm².
  'kgf/cm²': { label: 'kgf/cm²', toMPa: 0.0980665 },
} as const;

export type StressUnit = keyof typeof STRESS_UNITS;

export const STRESS_UNIT_NAMES = Object.keys(STRESS_UNITS) as StressUnit[];
