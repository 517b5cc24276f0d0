/**
 * The scan rate and where it came from, in the order the user expects: their own entry, the
 * time column (core scanRateFromTime), a preamble line, the file name. Every source that is
 * present is read, so that a disagreement between them can be reported.
 */
import { AnalysisError } from '../core/errors';
import { scanRateFromTime } from '../core/sweeps/scanRateFromTime';
import type { ScanRateSource, SweepSegment } from '../core/types';
import { ImportError, makeWarning } from './errors';
import type { ImportWarning } from './errors';
import { scanRateFromFileName } from './scanRateFromFileName';
import type { Guess, PreambleValue } from './types';

export interface ScanRateChoice {
  guess: Guess<number | null>;
  source: ScanRateSource | null;
}

interface Input {
  fileName: string;
  override: number | undefined;
  potentialV: Float64Array;
  timeS: Float64Array | null;
  segments: SweepSegment[];
  preamble: PreambleValue | null;
  /** A scan-rate line with a number but no unit (readScanRate.ts unitlessScanRateLine), or null. */
  unitless?: PreambleValue | null;
  /** True when the time column's unit was not in the file and seconds were assumed. */
  timeUnitAssumed?: boolean;
}

const fmt = (v: number) => (v >= 1 ? `${+v.toPrecision(4)} V/s` : `${+(v * 1000).toPrecision(4)} mV/s`);

export function chooseScanRate(input: Input, warnings: ImportWarning[]): ScanRateChoice {
  const { fileName } = input;
  if (input.override !== undefined && !(input.override > 0 && Number.isFinite(input.override))) {
    throw new ImportError('BAD_OVERRIDE', fileName, `the scan rate must be a positive number of V/s, got ${input.override}`);
  }
  const fromTime = timeRate(input, warnings);
  const fromName = scanRateFromFileName(fileName);
  const found: { source: ScanRateSource; value: number; why: string }[] = [];
  if (input.override !== undefined) found.push({ source: 'option', value: input.override, why: 'entered by the user' });
  if (fromTime) found.push({ source: 'time', value: fromTime.value, why: fromTime.why });
  if (input.preamble) found.push({ source: 'metadata', value: input.preamble.value, why: `from line ${input.preamble.line}: "${input.preamble.text}"` });
  if (fromName) found.push({ source: 'filename', value: fromName.scanRateVPerS, why: `from the file name ("${fromName.match}")` });
  const chosen = found[0];
  const bare = input.preamble ? null : (input.unitless ?? null);
  if (!chosen) {
    const line = bare ? `line ${bare.line} ("${bare.text}") names a scan rate but gives no unit, so it was not used (${bare.value} mV/s or ${bare.value} V/s?)` : 'no "scan rate" line';
    warnings.push(makeWarning('NO_SCAN_RATE', `${fileName}: no scan rate found (no time column, ${line}, none in the file name); enter it to use rate-dependent analyses`, bare ? [bare.line] : undefined));
    return { guess: { value: null, overridden: false, explanation: `scan rate unknown — no time column, ${bare ? `a scan-rate line without a unit on line ${bare.line} (not used)` : 'no scan-rate line in the preamble'}, none in the file name` }, source: null };
  }
  if (bare && chosen.source !== 'option') warnings.push(unitlessNote(fileName, bare, chosen));
  if (chosen.source === 'time' && input.timeUnitAssumed && !found.slice(1).some((f) => Math.abs(f.value / chosen.value - 1) <= 0.05)) {
    warnings.push(makeWarning('UNIT_ASSUMED', `${fileName}: no time unit found; read as seconds, which gives ${fmt(chosen.value)}. In milliseconds it would be ${fmt(chosen.value * 1000)}, and every rate-dependent result with it (D goes as 1/v): set the time unit if the column is not in seconds`));
  }
  for (const other of found.slice(1)) {
    if (Math.abs(other.value - chosen.value) > 0.05 * chosen.value) {
      warnings.push(makeWarning('SCAN_RATE_DISAGREES', `${fileName}: scan rate ${fmt(chosen.value)} (${chosen.source}) differs from ${fmt(other.value)} (${other.source}, ${other.why}); ${fmt(chosen.value)} is used${unitHint(chosen, other.value)}`));
    }
  }
  const others = found.slice(1).map((f) => `${f.source} says ${fmt(f.value)}`).join('; ');
  return {
    guess: { value: chosen.value, overridden: chosen.source === 'option', explanation: `scan rate ${fmt(chosen.value)} — ${chosen.why}${others ? ` (also: ${others})` : ''}` },
    source: chosen.source,
  };
}

/** The bare number of a unit-less scan-rate line, compared with the rate used (read as mV/s and as V/s). */
function unitlessNote(fileName: string, bare: PreambleValue, chosen: { source: ScanRateSource; value: number }): ImportWarning {
  const near = (v: number) => Math.abs(v / chosen.value - 1) <= 0.05;
  const reading = near(bare.value * 1e-3) ? `; read as mV/s it agrees` : near(bare.value) ? `; read as V/s it agrees` : `; it agrees with neither read as mV/s nor as V/s`;
  return makeWarning('SCAN_RATE_NO_UNIT', `${fileName}: line ${bare.line} ("${bare.text}") names a scan rate but gives no unit, so it was not used; ${fmt(chosen.value)} from the ${chosen.source === 'time' ? 'time column' : chosen.source === 'filename' ? 'file name' : chosen.source} is used${reading}`, [bare.line]);
}

/** A disagreement by a factor of 1000 or 60 usually means the time column's unit is wrong. */
function unitHint(chosen: { source: ScanRateSource; value: number }, other: number): string {
  if (chosen.source !== 'time') return '';
  const ratio = other / chosen.value;
  const near = (f: number) => Math.abs(ratio / f - 1) < 0.05;
  if (near(1000)) return ' — a factor of 1000: is the time column in ms? Set the time unit';
  if (near(1 / 60)) return ' — a factor of 60: is the time column in minutes? Set the time unit';
  return '';
}

function timeRate(input: Input, warnings: ImportWarning[]): { value: number; why: string } | null {
  if (!input.timeS) return null;
  try {
    const r = scanRateFromTime(input.potentialV, input.timeS, input.segments);
    if (r.relativeSpread > 0.1) {
      warnings.push(makeWarning('SCAN_RATE_UNEVEN', `${input.fileName}: the sweeps ran at different rates (${r.perSegmentVPerS.map(fmt).join(', ')}); the median ${fmt(r.scanRateVPerS)} is used`));
    }
    return { value: r.scanRateVPerS, why: `from the time column: median of ${r.perSegmentVPerS.length} per-sweep fits of |dE/dt|` };
  } catch (err) {
    if (!(err instanceof AnalysisError)) throw err;
    return null;
  }
}
