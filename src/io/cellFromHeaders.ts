/**
 * The cell values a series' files state in their headers (electrode area, concentration,
 * temperature, reference electrode), read the same way for the screen and the command line:
 * the first file that states a value gives it; a file that states another value, or a reference
 * electrode not in the table, is noted in words. Values in core units (cm², mol/cm³, K).
 */
import { findReferenceElectrode, type ReferenceId } from '../core/reference';
import type { Measurement } from './types';

export interface HeaderCell {
  areaCm2?: number;
  concentrationMolPerCm3?: number;
  temperatureK?: number;
  inputReference?: ReferenceId;
}

type Field = keyof HeaderCell;

const FIELD_WORDS: Record<Field, string> = {
  areaCm2: 'area (cm²)', concentrationMolPerCm3: 'concentration (mol/cm³)', temperatureK: 'temperature (K)', inputReference: 'reference',
};

/**
 * Reference electrode named in a header ("Ag/AgCl (3 M KCl)") → table id, or null. The table's
 * aliases are written without brackets or commas, so those are tried as spaces too.
 */
export function referenceIdOf(name: string): ReferenceId | null {
  return (findReferenceElectrode(name) ?? findReferenceElectrode(name.replace(/[(),]/g, ' ').trim()))?.id ?? null;
}

function valuesOf(m: Measurement): HeaderCell & { unknownReference?: string } {
  const out: HeaderCell & { unknownReference?: string } = {};
  if (m.areaCm2) out.areaCm2 = m.areaCm2.value;
  if (m.concentrationMolPerCm3) out.concentrationMolPerCm3 = m.concentrationMolPerCm3.value;
  if (m.temperatureK) out.temperatureK = m.temperatureK.value;
  if (m.referenceElectrode) {
    const id = referenceIdOf(m.referenceElectrode);
    if (id) out.inputReference = id;
    else out.unknownReference = m.referenceElectrode;
  }
  return out;
}

export function cellFromHeaders(measurements: readonly Pick<Measurement, 'fileName' | 'areaCm2' | 'concentrationMolPerCm3' | 'temperatureK' | 'referenceElectrode'>[]): { values: HeaderCell; sources: Partial<Record<Field, string>>; notes: string[] } {
  const values: HeaderCell = {};
  const sources: Partial<Record<Field, string>> = {};
  const notes: string[] = [];
  for (const m of measurements) {
    const found = valuesOf(m as Measurement);
    if (found.unknownReference) notes.push(`${m.fileName}: reference electrode "${found.unknownReference}" is not in the table; choose it by hand.`);
    for (const key of ['areaCm2', 'concentrationMolPerCm3', 'temperatureK', 'inputReference'] as const) {
      const v = found[key];
      if (v === undefined) continue;
      if (values[key] === undefined) {
        (values as Record<Field, unknown>)[key] = v;
        sources[key] = m.fileName;
      } else if (values[key] !== v) {
        notes.push(`${m.fileName} states ${FIELD_WORDS[key]} ${String(v)}, ${sources[key] ?? ''} ${String(values[key])}; the series uses the first.`);
      }
    }
  }
  return { values, sources, notes };
}
