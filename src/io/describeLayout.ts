/**
 * One plain-words line describing how a file was read, for the results sheet and the command
 * line's records: "comma-separated, decimal point, header on line 3, rows 4–2204 (2201 read,
 * 0 skipped), potential E [V], current I [µA], time t [s], current sign anodic positive (IUPAC)".
 */
import { CONVENTION_CHOICES, DECIMAL_CHOICES, DELIMITER_CHOICES, labelOf } from './overrideChoices';
import type { Measurement } from './types';

export function describeLayout(m: Pick<Measurement, 'detection'>): string {
  const d = m.detection;
  const columns = d.columns
    .filter((c) => c.role === 'potential' || c.role === 'current' || c.role === 'time' || c.role === 'cycle')
    .map((c) => `${c.role} ${c.name}${c.unit ? ` [${c.unit}]` : ''}`);
  return [
    `${labelOf(DELIMITER_CHOICES, d.delimiter.value)}-separated`,
    `decimal ${labelOf(DECIMAL_CHOICES, d.decimalMark.value)}`,
    d.headerLine.value === null ? 'no header line' : `header on line ${d.headerLine.value}`,
    `rows ${d.tableLines.first}–${d.tableLines.last} (${d.rowsRead} read, ${d.rowsSkipped} skipped)`,
    ...columns,
    `current sign ${labelOf(CONVENTION_CHOICES, d.currentConvention.value)}`,
  ].join(', ');
}
