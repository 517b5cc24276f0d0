/**
 * Picks the SI-prefixed current unit in which the largest |current| reads between 1 and 1000,
 * so axes and tables show "12.3 µA" rather than "1.23e-5 A".
 */
export interface UnitScale {
  unit: string;
  /** Multiply a value in the base unit by this to get the shown number. */
  factor: number;
}

const CURRENT_UNITS: UnitScale[] = [
  { unit: 'A', factor: 1 },
  { unit: 'mA', factor: 1e3 },
  { unit: 'µA', factor: 1e6 },
  { unit: 'nA', factor: 1e9 },
  { unit: 'pA', factor: 1e12 },
];

export function chooseCurrentScale(maxAbsA: number): UnitScale {
  if (!(maxAbsA > 0) || !Number.isFinite(maxAbsA)) return CURRENT_UNITS[2] as UnitScale;
  for (const scale of CURRENT_UNITS) {
    if (maxAbsA * scale.factor >= 1) return scale;
  }
  return CURRENT_UNITS[CURRENT_UNITS.length - 1] as UnitScale;
}

/** Largest |value| over [start, end). */
export function maxAbs(values: ArrayLike<number>, start = 0, end = values.length): number {
  let m = 0;
  for (let i = start; i < end; i++) {
    const v = Math.abs(values[i] as number);
    if (v > m) m = v;
  }
  return m;
}
