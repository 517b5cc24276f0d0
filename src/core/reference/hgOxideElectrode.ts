/**
 * Potential of a mercury/mercury(II) oxide electrode in a hydroxide filling of known
 * concentration, against SHE at 25 °C, on one stated basis for every filling:
 *   HgO + H₂O + 2e⁻ → Hg + 2OH⁻,  E = E° − (RT/F)·ln a(OH⁻),  a(OH⁻) = γ±·c.
 * In: the hydroxide (NaOH or KOH) and its concentration (mol/L, 0.1 or 1). Out: V vs SHE.
 * Sources: E°(HgO/Hg, OH⁻) = 0.0977 V, Bard & Faulkner, Electrochemical Methods 2nd ed. (2001),
 *   Appendix C (from memory); it equals E° of the acid form, HgO + 2H⁺ + 2e⁻ → Hg + H₂O, 0.926 V,
 *   less (ln 10)(RT/F)·pKw. Mean activity coefficients γ± at 0.1 and 1.0 mol/kg: R. A. Robinson,
 *   R. H. Stokes, Electrolyte Solutions 2nd ed. revised (1959), Appendix 8.10 (from memory):
 *   NaOH 0.766 and 0.679, KOH 0.798 and 0.756.
 * Differences from a rigorous value: the single-ion activity of OH⁻ is taken as γ± (a convention);
 *   molarity is taken as molality (1 M NaOH is about 1.02 mol/kg: < 0.5 mV); the water activity
 *   term (RT/2F)·ln a(H₂O) is left out (< 0.5 mV at 1 M); no liquid junction.
 */
import { STANDARD_TEMPERATURE_K, thermalVoltageV } from '../constants';

/** E°(HgO/Hg, OH⁻) at 25 °C (V vs SHE), Bard & Faulkner 2001 Appendix C (from memory). */
export const HG_OXIDE_STANDARD_POTENTIAL_V = 0.0977;

/** γ± of the hydroxide at 0.1 and 1.0 mol/kg, Robinson & Stokes 1959 App. 8.10 (from memory). */
export const HYDROXIDE_ACTIVITY_COEFFICIENT: Record<'NaOH' | 'KOH', Record<'0.1' | '1', number>> = {
  NaOH: { '0.1': 0.766, '1': 0.679 },
  KOH: { '0.1': 0.798, '1': 0.756 },
};

export const HG_OXIDE_BASIS = 'E° = 0.0977 V (Bard & Faulkner 2001, App. C, from memory) − (RT/F)·ln(γ±·c), γ± from Robinson & Stokes, Electrolyte Solutions (1959), App. 8.10 (from memory); no liquid junction';

/** E of Hg/HgO in `molar` mol/L NaOH or KOH at 25 °C (V vs SHE). */
export function hgOxideElectrodeVsSheV(base: 'NaOH' | 'KOH', molar: 0.1 | 1): number {
  const gamma = HYDROXIDE_ACTIVITY_COEFFICIENT[base][molar === 1 ? '1' : '0.1'];
  return HG_OXIDE_STANDARD_POTENTIAL_V - thermalVoltageV(STANDARD_TEMPERATURE_K) * Math.log(gamma * molar);
}

/**
 * pH of the filling on the activity scale, pH = pKw + log10 a(OH⁻) (a(H₂O) taken as 1); pKw = 13.995
 * at 25 °C (Marshall & Franck, J. Phys. Chem. Ref. Data 10 (1981) 295, from memory).
 */
export function hydroxideFillingPh(base: 'NaOH' | 'KOH', molar: 0.1 | 1, pKw = 13.995): number {
  return pKw + Math.log10(HYDROXIDE_ACTIVITY_COEFFICIENT[base][molar === 1 ? '1' : '0.1'] * molar);
}

/**
 * E° of the acid form, HgO + 2H⁺ + 2e⁻ → Hg + H₂O, at 25 °C (V vs SHE): the OH⁻ form plus
 * (ln 10)(RT/F)·pKw = 0.9256 V (Bard & Faulkner 2001, App. C, gives 0.926 V, from memory).
 */
export const HG_OXIDE_ACID_STANDARD_POTENTIAL_V = HG_OXIDE_STANDARD_POTENTIAL_V + Math.LN10 * thermalVoltageV(STANDARD_TEMPERATURE_K) * 13.995;

/** The pH a hydroxide filling is usually stated at: 14 + log10 c (1 M → 14, 0.1 M → 13; common practice, no source). */
export function hydroxideNominalPh(molar: 0.1 | 1): number {
  return 14 + Math.log10(molar);
}

/**
 * Hg/HgO in a hydroxide filling against an RHE in a solution of pH `pH` (V): both electrodes
 * answer to pH alike (HgO + 2H⁺ + 2e⁻ → Hg + H₂O and 2H⁺ + 2e⁻ → H₂), so in the filling's own
 * solution the pair reads E° of the acid form, 0.926 V, whatever the pH; in another solution
 * 0.926 V + (ln 10)(RT/F)·(pH − pH_fill), no junction. The filling's pH is its nominal one
 * (hydroxideNominalPh), the scale on which the pH of a hydroxide solution is usually given, so a
 * pH stated the same way cancels: 1 M KOH at pH 14 gives 0.926 V, as E_RHE = E + 0.098 V +
 * 0.0592·pH does. On the activity scale the same filling is at pH 13.87 (hydroxideFillingPh):
 * going through SHE with the activity value of the electrode and a nominal pH would read 7–10 mV
 * high. The E° is the 25 °C value; the pH slope is taken at `temperatureK`.
 */
export function hgOxideVsRheV(molar: 0.1 | 1, pH: number, temperatureK = STANDARD_TEMPERATURE_K): number {
  return HG_OXIDE_ACID_STANDARD_POTENTIAL_V + Math.LN10 * thermalVoltageV(temperatureK) * (pH - hydroxideNominalPh(molar));
}
