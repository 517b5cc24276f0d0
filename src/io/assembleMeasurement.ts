/**
 * Last stage of the import: column roles and units, conversion to core columns, sign
 * convention, scan rate, and the Measurement with its detection report.
 */
import { assignColumns } from './assignColumns';
import type { RoleAssignment } from './assignColumns';
import { chooseScanRate } from './chooseScanRate';
import { refuseNumberLikeColumns } from './droppedRows';
import { loopOrientation } from '../core/sweeps/loopOrientation';
import { makeWarning } from './errors';
import type { ImportWarning } from './errors';
import type { HeaderFound } from './detectHeader';
import type { FrontMatter } from './importVoltammogram';
import { measurementId } from './measurementId';
import { leaveOutNumericFooter } from './numericFooter';
import type { ParsedTable } from './parseTable';
import type { PreambleReading } from './readPreamble';
import { scanRateIn } from './readScanRate';
import { chooseCurrentKind, chooseReference } from './recordingGuesses';
import { buildColumns, chooseUnits } from './toMeasurement';
import type { CoreColumns, UnitChoice } from './toMeasurement';
import type { CurrentConvention, Guess, ImportDetection, ImportOverrides, Measurement, PreambleValue } from './types';
import type { ScanRateChoice } from './chooseScanRate';

export function assembleMeasurement(fileName: string, front: FrontMatter, table: ParsedTable, o: ImportOverrides, warnings: ImportWarning[]): Measurement {
  const { pre } = front;
  const { header } = front;
  refuseNumberLikeColumns(fileName, table, header.names, front.layout.decimalMark.value === ',');
  const roles = assignColumns(fileName, header.names, table.columns, o, header.units);
  warnings.push(...roles.warnings);
  leaveOutNumericFooter(fileName, table, roles.potentialColumn, warnings);
  let convention = chooseConvention(o, pre);
  const units = chooseUnits(fileName, roles, o, warnings);
  const kind = chooseCurrentKind(fileName, units, roles, pre.areaCm2, warnings);
  const reference = chooseReference(fileName, pre, roles, header, warnings);
  const cols = buildColumns(fileName, table, roles, units, convention.value, pre.areaCm2, front.layout.decimalMark.value === ',', warnings);
  const written = pre.scanRateVPerS ?? scanRateInNames(header);
  const scan = chooseScanRate({ fileName, override: o.scanRateVPerS, potentialV: cols.potentialV, timeS: cols.timeS, segments: cols.split.segments, preamble: written, unitless: pre.scanRateWithoutUnit, timeUnitAssumed: units.time !== null && !units.time.overridden && roles.headers[roles.timeColumn ?? -1]?.unit?.kind !== 'time' }, warnings);
  const doubt = !convention.overridden && !pre.convention ? reversedLoop(cols) : null;
  if (doubt) {
    convention = { ...convention, explanation: `${convention.explanation}; but the loop of cycle ${doubt.cycle} runs the polarographic way round (∮ i dE / ∮ |i dE| = ${doubt.orientation.toFixed(2)}): check` };
    warnings.push(makeWarning('CONVENTION_DOUBTED', `${fileName}: the current runs round the loop the wrong way for anodic-positive (IUPAC) currents (over cycle ${doubt.cycle}, ∮ i dE / ∮ |i dE| = ${doubt.orientation.toFixed(2)}); the file does not say which sign it uses. If the instrument records cathodic current as positive (polarographic convention), set that convention for this file: read as they are, its peaks are missed or taken the wrong way round`));
  }
  if (cols.timeS && !isNonDecreasing(cols.timeS)) {
    warnings.push(makeWarning('TIME_NOT_MONOTONIC', `${fileName}: the time column goes backwards in places (restarts per cycle?); it is kept as read`));
  }
  return {
    id: measurementId(fileName, front.text),
    fileName,
    potentialV: cols.potentialV,
    currentA: cols.currentA,
    timeS: cols.timeS,
    segments: cols.split.segments,
    cycles: cols.split.cycles,
    scanRateVPerS: scan.guess.value,
    scanRateSource: scan.source,
    metadata: pre.metadata,
    preamble: front.preambleLines,
    currentConvention: convention.value,
    currentKind: kind.guess.value,
    densityAreaCm2: kind.areaCm2,
    referenceElectrode: reference.value,
    temperatureK: pre.temperatureK,
    areaCm2: pre.areaCm2,
    concentrationMolPerCm3: pre.concentrationMolPerCm3,
    cycleColumn: cols.cycleColumn,
    extraColumns: cols.extraColumns,
    detection: { ...buildDetection(front, table, roles, units, convention, scan, cols), currentKind: kind.guess, reference },
  };
}

/**
 * How far below zero the loop orientation of the first closed cycle must be before the file's
 * currents are doubted (core/sweeps/loopOrientation.ts; common practice, no source). A featureless
 * trace gives about 0; simulated couples read as IUPAC gave 0.6–1, and still 0.13 when started
 * far on the wrong side of E°′ with only the other form present.
 */
const REVERSED_LOOP_BELOW = -0.1;

/**
 * Read as IUPAC (the file states no convention), a first closed cycle whose loop runs the other
 * way round means the instrument most likely wrote cathodic current as positive. Said, not
 * changed: a chemist can tell, the import cannot.
 */
function reversedLoop(cols: CoreColumns): { cycle: number; orientation: number } | null {
  for (const c of cols.split.cycles) {
    const orientation = loopOrientation(cols.potentialV, cols.currentA, c.start, c.end);
    if (orientation !== null) return orientation < REVERSED_LOOP_BELOW ? { cycle: c.index, orientation } : null;
  }
  return null;
}

/** A scan rate written in a column name ("j @ 50 mV s-1"), as a preamble value on the header line. */
function scanRateInNames(header: HeaderFound): PreambleValue | null {
  if (!header.names || header.guess.value === null) return null;
  for (const n of header.names) {
    const found = scanRateIn(n.slice(0, 200), header.guess.value);
    if (found) return found;
  }
  return null;
}

function buildDetection(front: FrontMatter, table: ParsedTable, roles: RoleAssignment, units: UnitChoice, convention: Guess<CurrentConvention>, scan: ScanRateChoice, cols: CoreColumns): Omit<ImportDetection, 'currentKind' | 'reference'> {
  const { header } = front;
  const { layout } = front;
  return {
    encoding: front.decoded.encoding,
    lineEnding: front.lineEnding,
    delimiter: layout.delimiter,
    decimalMark: layout.decimalMark,
    headerLine: header.guess,
    headerBlock: {
      namesLine: header.guess.value,
      unitsLine: header.unitsLine === null ? null : header.unitsLine + 1,
      commentLines: header.commentLines.map((i) => i + 1),
    },
    columns: roles.columns,
    potentialUnit: units.potential,
    currentUnit: units.current,
    timeUnit: units.time,
    currentConvention: convention,
    scanRate: scan.guess,
    tableLines: { first: layout.firstDataLine + 1, last: table.lastDataLine },
    rowsRead: cols.rowsKept,
    rowsSkipped: table.skippedCount + cols.rowsDropped + (table.cutLastLine === null ? 0 : 1),
    headLines: front.headLines,
    footer: { lines: table.footerLines, firstLine: table.firstFooterLine },
    cycleCount: cols.split.cycles.length,
  };
}

function chooseConvention(o: ImportOverrides, pre: PreambleReading): Guess<CurrentConvention> {
  if (o.currentConvention) return { value: o.currentConvention, overridden: true, explanation: `current convention ${o.currentConvention} (set by the user)` };
  if (pre.convention) return { value: pre.convention.value, overridden: false, explanation: `current convention ${pre.convention.value} — line ${pre.convention.line}: "${pre.convention.text}"` };
  return { value: 'iupac', overridden: false, explanation: 'current convention IUPAC (anodic positive) — the file does not say otherwise' };
}

function isNonDecreasing(a: Float64Array): boolean {
  for (let i = 1; i < a.length; i++) if ((a[i] as number) < (a[i - 1] as number)) return false;
  return true;
}
