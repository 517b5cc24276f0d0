/**
 * The order files are listed in, on screen and on the command line alike: natural order, with
 * numbers compared by value ("run2" before "run10", "20mVs" before "100mVs"), decimal numbers
 * too ("0.05Vs" before "0.1Vs", "0,5 Vs" before "2 Vs": scan rates in V/s are written so), case
 * ignored. Method: common practice, no source.
 */
const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

/** Digits after a decimal point or comma that follows digits. */
const FRACTION = /(\d[.,])(\d+)/g;
const FRACTION_DIGITS = 12;

/**
 * The name with each decimal fraction right-padded to a fixed width, so that the collator's
 * whole-number comparison orders fractions by value: "0.05" → "0.050000000000", "0.1" → "0.100000000000".
 */
function padFractions(name: string): string {
  return name.replace(FRACTION, (_m, head: string, digits: string) => head + digits.slice(0, FRACTION_DIGITS).padEnd(FRACTION_DIGITS, '0'));
}

export function naturalCompare(a: string, b: string): number {
  return collator.compare(padFractions(a), padFractions(b)) || collator.compare(a, b);
}
