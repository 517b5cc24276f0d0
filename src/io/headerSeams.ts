/**
 * Exports joined one after another repeat their header inside the table. A repeat that names the
 * same columns with other units ("Potential (mV)" under a first header "Potential (V)") starts a
 * block written in those units: its values are converted to the first header's units, so that
 * the whole column is in one unit; a unit that cannot be converted (none in one of the two
 * headers, another kind of quantity) refuses the file with the line of the repeat. Unit factors:
 * BIPM, SI Brochure, 9th ed. (2019), Table 7 (prefixes), through units.ts.
 */
import { ImportError, makeWarning } from './errors';
import type { ImportWarning } from './errors';
import type { HeaderFound } from './detectHeader';
import { readHeader } from './headerNames';
import type { ParsedTable } from './parseTable';

const labelOf = (name: string): string => readHeader(name).label.toLowerCase();

/** Tells a line naming the header's columns (same labels) with other units; undefined without a header. */
export function sameNamesOtherUnits(header: HeaderFound): ((fields: string[]) => boolean) | undefined {
  const names = header.names;
  if (!names) return undefined;
  const labels = names.map(labelOf);
  if (labels.every((l) => l === '')) return undefined;
  return (fields) => {
    if (fields.length < labels.length || fields.slice(labels.length).some((f) => f !== '')) return false;
    return labels.every((l, j) => labelOf(fields[j] as string) === l);
  };
}

/** Converts each block under a repeated header with other units to the first header's units. */
export function convertSeamBlocks(fileName: string, t: ParsedTable, header: HeaderFound, warnings: ImportWarning[]): void {
  const names = header.names;
  if (!names || !t.headerSeams.some((s) => s.names)) return;
  const notes: string[] = [];
  t.headerSeams.forEach((seam, s) => {
    if (!seam.names) return;
    const end = t.headerSeams[s + 1]?.row ?? t.rowCount;
    for (let j = 0; j < names.length; j++) {
      const factor = factorFor(fileName, names[j] as string, header.units?.[j] ?? '', seam.names[j] as string, seam.line, j);
      if (factor === 1) continue;
      const c = t.columns[j] as Float64Array;
      for (let r = seam.row; r < end; r++) c[r] = (c[r] as number) * factor;
      notes.push(`from line ${seam.line}, column ${j + 1} "${seam.names[j] as string}" converted to the unit of line ${(header.guess.value ?? 0)} ("${names[j] as string}")`);
    }
  });
  if (notes.length) warnings.push(makeWarning('REPEATED_HEADER', `${fileName}: a repeated header changes units inside the table (exports joined): ${notes.join('; ')}`, t.headerSeams.filter((s) => s.names).map((s) => s.line)));
}

/** Factor from the repeat's unit to the first header's unit; throws when there is none. */
function factorFor(fileName: string, first: string, firstUnitCell: string, repeat: string, line: number, j: number): number {
  const a = readHeader(first, firstUnitCell);
  const b = readHeader(repeat);
  if ((a.unit?.symbol ?? '') === (b.unit?.symbol ?? '')) return 1;
  if (!a.unit || !b.unit || a.unit.kind !== b.unit.kind) {
    throw new ImportError('UNITS_CHANGE', fileName, `line ${line} repeats the header with column ${j + 1} "${repeat}" where the first header says "${first}${firstUnitCell ? ` [${firstUnitCell}]` : ''}", and the two units cannot be converted into each other; cut the file into its exports and read each alone`, { line, column: j + 1 });
  }
  return b.unit.factor / a.unit.factor;
}
