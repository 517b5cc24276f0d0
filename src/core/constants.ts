/**
 * Physical constants, CODATA 2018 (exact in the 2019 SI).
 * Source: E. Tiesinga, P. J. Mohr, D. B. Newell, B. N. Taylor, "CODATA recommended values of the
 *   fundamental physical constants: 2018", Rev. Mod. Phys. 93, 025010 (2021).
 */
export const FARADAY_C_PER_MOL = 96485.33212;
export const GAS_CONSTANT_J_PER_MOL_K = 8.314462618;
export const ZERO_CELSIUS_K = 273.15;
/** 25 °C, the temperature of most tabulated values. */
export const STANDARD_TEMPERATURE_K = 298.15;

/** RT/F in volts at the given temperature. */
export function thermalVoltageV(temperatureK: number): number {
  return (GAS_CONSTANT_J_PER_MOL_K * temperatureK) / FARADAY_C_PER_MOL;
}

/** F/(RT) in 1/V at the given temperature. */
export function inverseThermalVoltagePerV(temperatureK: number): number {
  return FARADAY_C_PER_MOL / (GAS_CONSTANT_J_PER_MOL_K * temperatureK);
}
