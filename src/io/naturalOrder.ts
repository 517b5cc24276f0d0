/**
 * The order files are listed in, on screen and on the command line alike: natural order, with
 * numbers compared by value ("run2" before "run10", "20mVs" before "100mVs"), case ignored.
 */
const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

export function naturalCompare(a: string, b: string): number {
  return collator.compare(a, b);
}
