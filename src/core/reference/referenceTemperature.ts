/**
 * How far a reference electrode's potential moves from its 25 °C value at another temperature,
 * where a published temperature dependence exists (calomel; silver/silver chloride with a fixed
 * KCl filling). The cell and the reference are taken at the same temperature (isothermal).
 * In: the electrode id, its 25 °C potential vs SHE (V), the temperature (K).
 * Out: the shift (V) to add to the 25 °C value, and its source; null where none is known.
 * Sources:
 *   calomel, t in °C (D. J. G. Ives, G. J. Janz, Reference Electrodes: Theory and Practice,
 *     Academic Press (1961), ch. 3, as reproduced in electrochemistry handbooks; from memory, the
 *     higher-order terms unsure):
 *       sat. KCl  E = 0.2412 − 6.61·10⁻⁴(t − 25) − 1.75·10⁻⁶(t − 25)² − 9.0·10⁻¹⁰(t − 25)³
 *       1 M KCl   E = 0.2801 − 2.75·10⁻⁴(t − 25) − 2.50·10⁻⁶(t − 25)² − 4·10⁻⁹(t − 25)³
 *       0.1 M KCl E = 0.3337 − 8.75·10⁻⁵(t − 25) − 3·10⁻⁶(t − 25)²
 *   Ag/AgCl standard potential (R. G. Bates, V. E. Bower, J. Res. NBS 53, 283 (1954), 0–95 °C,
 *     from memory): E° = 0.23659 − 4.8564·10⁻⁴t − 3.4205·10⁻⁶t² + 5.869·10⁻⁹t³. An electrode
 *     filled with KCl of fixed concentration follows the Nernst equation at fixed chloride
 *     activity: E(T) = E°(T) + (T/298.15)·(E₂₅ − E°₂₅) (our derivation; it neglects the change of
 *     the activity coefficient and of the liquid junction with temperature, a few tenths of a mV
 *     over ±20 K).
 * Not covered (warned about): saturated Ag/AgCl and SSCE (the KCl/NaCl solubility changes with
 *   temperature), Hg/Hg₂SO₄, Hg/HgO. Calomel is applied over 0–60 °C (our limit), Ag/AgCl over
 *   0–95 °C (the range of Bates & Bower).
 */
import { STANDARD_TEMPERATURE_K, ZERO_CELSIUS_K } from '../constants';
import type { ReferenceId } from './referenceElectrodes';

export interface ReferenceTemperatureShift {
  shiftV: number;
  source: string;
}

const IVES_JANZ = 'calomel temperature dependence of Ives & Janz (1961), from memory';
const CALOMEL: Partial<Record<ReferenceId, number[]>> = {
  SCE: [-6.61e-4, -1.75e-6, -9.0e-10],
  NCE: [-2.75e-4, -2.5e-6, -4e-9],
  'calomel-0.1M': [-8.75e-5, -3e-6, 0],
};
const SILVER_CHLORIDE_FIXED: ReferenceId[] = ['AgCl-3.5M', 'AgCl-3M', 'AgCl-1M', 'AgCl-0.1M'];

/** E° of AgCl/Ag (V vs SHE) at t °C, Bates & Bower (1954). */
export function silverChlorideStandardPotentialV(temperatureC: number): number {
  const t = temperatureC;
  return 0.23659 - 4.8564e-4 * t - 3.4205e-6 * t * t + 5.869e-9 * t * t * t;
}

/** Shift from the 25 °C value at temperatureK, or null when no published dependence is applied. */
export function referenceTemperatureShift(id: ReferenceId, eAt25VsSheV: number, temperatureK: number): ReferenceTemperatureShift | null {
  const t = temperatureK - ZERO_CELSIUS_K;
  const dt = t - 25;
  const calomel = CALOMEL[id];
  if (calomel) {
    if (t < 0 || t > 60) return null;
    return { shiftV: calomel[0]! * dt + calomel[1]! * dt * dt + calomel[2]! * dt * dt * dt, source: IVES_JANZ };
  }
  if (SILVER_CHLORIDE_FIXED.includes(id)) {
    if (t < 0 || t > 95) return null;
    const e25 = silverChlorideStandardPotentialV(25);
    const shiftV = silverChlorideStandardPotentialV(t) - e25 + (temperatureK / STANDARD_TEMPERATURE_K - 1) * (eAt25VsSheV - e25);
    return { shiftV, source: 'E°(AgCl/Ag) of Bates & Bower (1954, from memory) with the Nernst term at fixed chloride activity' };
  }
  return null;
}
