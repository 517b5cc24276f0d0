/**
 * Files that give current densities (A/cm², no electrode area stated) are fitted per cm² of
 * electrode, as the run analyses them (analyzeRunSeries): area 1 cm², so D, Γ and C_dl come out
 * per cm², and the ohmic drop is j·(R_u·A), so a held R_u (Ω) becomes R_u·A (Ω·cm²) with the
 * cell's area, or cannot be used without one. Densities and currents in one fit are refused.
 * In: each record's current kind and file name, the cell, the held R_u (Ω) and the cell's area
 * (cm², null when unknown). Out: the cell and held R_u to fit with, and notes saying so.
 * Source: Ohm's law for a current density, common practice, no source.
 */
import { AnalysisError } from '../errors';
import type { CurrentKind } from '../types';
import type { FitCell } from './fitTypes';

export interface PerAreaFit {
  cell: FitCell;
  ruOhm: number | undefined;
  perArea: boolean;
  notes: string[];
}

export function perAreaFit(records: ReadonlyArray<{ fileName: string; currentKind?: CurrentKind }>, cell: FitCell, ruOhm: number | undefined, areaCm2: number | null): PerAreaFit {
  const densities = records.filter((r) => r.currentKind === 'density');
  if (!densities.length) return { cell, ruOhm, perArea: false, notes: [] };
  if (densities.length < records.length) {
    throw new AnalysisError('BAD_OPTION', `${densities.map((r) => `"${r.fileName}"`).join(', ')} hold current densities (A/cm²) and the other files currents (A): fit them separately`);
  }
  const notes = ['the files give current densities (A/cm²) and no area: fitted with A = 1 cm², so D, Γ and C_dl are per cm² of electrode and R_u is R_u·A in Ω·cm²'];
  const areaKnown = areaCm2 !== null && Number.isFinite(areaCm2) && areaCm2 > 0;
  if ((ruOhm ?? 0) > 0 && !areaKnown) notes.push('R_u of the cell was not used: with current densities it needs the electrode area');
  const held = ruOhm === undefined ? undefined : areaKnown ? ruOhm * areaCm2 : 0;
  return { cell: { ...cell, areaCm2: 1 }, ruOhm: held, perArea: true, notes };
}
