/**
 * The one place where the units users type (°C, mM, mV) meet the core's units (K, mol/cm³, V).
 * Sources: BIPM, The International System of Units (SI Brochure), 9th ed. (2019), §2.3.1
 *   (T/K = t/°C + 273.15) and Table 8 (litre: 1 L = 1 dm³ = 1000 cm³, so
 *   1 mM = 1 mmol/L = 1e-3 mol / 1000 cm³ = 1e-6 mol/cm³).
 * io/, state/, the CLI and the UI convert through these functions and nowhere else.
 */
import { ZERO_CELSIUS_K } from './constants';

/** t/°C → T/K. */
export function celsiusToKelvin(temperatureC: number): number {
  return temperatureC + ZERO_CELSIUS_K;
}

/** T/K → t/°C, rounded to 12 significant digits so that 298.15 K reads back as 25 °C. */
export function kelvinToCelsius(temperatureK: number): number {
  return Number((temperatureK - ZERO_CELSIUS_K).toPrecision(12));
}

/** mM (mmol/L) → mol/cm³. */
export function millimolarToMolPerCm3(concentrationMM: number): number {
  return concentrationMM * 1e-6;
}

/** mol/cm³ → mM, rounded to 12 significant digits so that 1e-6 reads back as 1 mM. */
export function molPerCm3ToMillimolar(concentrationMolPerCm3: number): number {
  return Number((concentrationMolPerCm3 * 1e6).toPrecision(12));
}

/** Area of a disk of the given diameter: π d²/4, in cm² from cm. */
export function diskAreaCm2(diameterCm: number): number {
  return (Math.PI * diameterCm * diameterCm) / 4;
}

/** `value.toFixed(digits)` without a minus on a value that rounds to zero ("0.0000", not "-0.0000"). */
export function formatFixed(value: number, digits: number): string {
  const text = value.toFixed(digits);
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

/** A scan rate for messages, without a binary-float tail: 0.1 V/s read from a time column is 0.10000000000000005. */
export function formatScanRate(scanRateVPerS: number): string {
  return `${Number(scanRateVPerS.toPrecision(6))} V/s`;
}

/** A potential difference in mV for messages, e.g. "59.2 mV" (digits after the point). */
export function formatMillivolts(potentialV: number, digits = 1): string {
  return `${(potentialV * 1000).toFixed(digits)} mV`;
}
