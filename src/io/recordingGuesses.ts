/**
 * Two guesses about what the numbers mean, each with its evidence: the scale the potentials were
 * recorded against (the preamble's "Reference electrode:" line first, else the potential
 * column's name or units-row entry), and whether the current column holds a current or a
 * current density (and whether an area from the preamble turned the density into a current).
 */
import { findReferenceElectrode } from '../core/reference/referenceElectrodes';
import type { RoleAssignment } from './assignColumns';
import { makeWarning } from './errors';
import type { ImportWarning } from './errors';
import type { HeaderFound } from './detectHeader';
import type { PreambleReading } from './readPreamble';
import type { UnitChoice } from './toMeasurement';
import type { CurrentKind, Guess, PreambleValue } from './types';

export function chooseReference(fileName: string, pre: PreambleReading, roles: RoleAssignment, header: HeaderFound, warnings: ImportWarning[]): Guess<string | null> {
  const h = roles.headers[roles.potentialColumn];
  const fromColumn = h?.reference ?? null;
  const where = h?.referenceFrom === 'units row' && header.unitsLine !== null
    ? `the potential column's unit "${h.unitText}" in the units row on line ${header.unitsLine + 1}`
    : `the potential column's name "${roles.columns[roles.potentialColumn]?.name ?? ''}"${header.guess.value !== null ? ` on line ${header.guess.value}` : ''}`;
  if (pre.referenceElectrode) {
    const p = pre.referenceElectrode;
    if (fromColumn && !sameReference(fromColumn, p.value)) {
      warnings.push(makeWarning('REFERENCE_DISAGREES', `${fileName}: line ${p.line} names the reference "${p.value}", but ${where} says "${fromColumn}"; "${p.value}" is used — check which one the potentials are against`));
    }
    return { value: p.value, overridden: false, explanation: `reference ${p.value} — line ${p.line} of the preamble` };
  }
  if (fromColumn) return { value: fromColumn, overridden: false, explanation: `reference ${fromColumn} — written with ${where}` };
  return { value: null, overridden: false, explanation: 'reference not named in the file — set the recording scale in the cell values' };
}

function sameReference(a: string, b: string): boolean {
  const ra = findReferenceElectrode(a);
  const rb = findReferenceElectrode(b);
  return ra && rb ? ra.id === rb.id : a.trim().toLowerCase() === b.trim().toLowerCase();
}

export interface CurrentKindChoice {
  guess: Guess<CurrentKind>;
  /** The preamble's area the density was multiplied by, or null. */
  areaCm2: PreambleValue | null;
}

export function chooseCurrentKind(fileName: string, units: UnitChoice, roles: RoleAssignment, area: PreambleValue | null, warnings: ImportWarning[]): CurrentKindChoice {
  const column = `column ${roles.currentColumn + 1} "${roles.columns[roles.currentColumn]?.name ?? ''}"`;
  if (!units.currentDensity) {
    return { guess: { value: 'current', overridden: units.current.overridden, explanation: `current — ${column} holds a current (${units.current.value})` }, areaCm2: null };
  }
  if (area) {
    warnings.push(makeWarning('CURRENT_DENSITY', `${fileName}: ${column} is a current density; multiplied by the electrode area ${area.value} cm² from line ${area.line} to give currents`));
    return { guess: { value: 'current', overridden: false, explanation: `current — ${column} is a current density (${units.densitySymbol}), multiplied by the area ${area.value} cm² stated on line ${area.line}` }, areaCm2: area };
  }
  warnings.push(makeWarning('CURRENT_DENSITY', `${fileName}: ${column} is a current density and the file states no electrode area; values are kept per cm² (A/cm²), and results from this file are densities`));
  return { guess: { value: 'density', overridden: false, explanation: `density — ${column} is a current density (${units.densitySymbol}) and the file states no electrode area, so the values are kept in A/cm²` }, areaCm2: null };
}
