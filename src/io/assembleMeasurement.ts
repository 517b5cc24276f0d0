/**
 * Last stage of the import: column roles and units, conversion to core columns, sign
 * convention, scan rate, and the Measurement with its detection report.
 */
import { assignColumns } from './assignColumns';
import type { RoleAssignment } from './assignColumns';
import { chooseScanRate } from './chooseScanRate';
import { makeWarning } from './errors';
import type { ImportWarning } from './errors';
import type { FrontMatter } from './importVoltammogram';
import { measurementId } from './measurementId';
import type { ParsedTable } from './parseTable';
import type { PreambleReading } from './readPreamble';
import { buildColumns, chooseUnits } from './toMeasurement';
import type { CoreColumns, UnitChoice } from './toMeasurement';
import type { CurrentConvention, Guess, ImportDetection, ImportOverrides, Measurement } from './types';
import type { ScanRateChoice } from './chooseScanRate';

export function assembleMeasurement(fileName: string, front: FrontMatter, table: ParsedTable, o: ImportOverrides, warnings: ImportWarning[]): Measurement {
  const { pre } = front;
  const roles = assignColumns(fileName, front.header.names, table.columns, o);
  warnings.push(...roles.warnings);
  const convention = chooseConvention(o, pre);
  const units = chooseUnits(fileName, roles, o, warnings);
  if (units.currentDensity) {
    warnings.push(makeWarning('CURRENT_DENSITY', pre.areaCm2
      ? `${fileName}: the current column is a current density; multiplied by the area ${pre.areaCm2.value} cm² from line ${pre.areaCm2.line}`
      : `${fileName}: the current column is a current density and the file states no electrode area; values are kept per cm² (as if the area were 1 cm²)`));
  }
  const cols = buildColumns(fileName, table, roles, units, convention.value, pre.areaCm2, warnings);
  const scan = chooseScanRate({ fileName, override: o.scanRateVPerS, potentialV: cols.potentialV, timeS: cols.timeS, segments: cols.split.segments, preamble: pre.scanRateVPerS }, warnings);
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
    referenceElectrode: pre.referenceElectrode?.value ?? roles.headers[roles.potential]?.reference ?? null,
    temperatureK: pre.temperatureK,
    areaCm2: pre.areaCm2,
    concentrationMolPerCm3: pre.concentrationMolPerCm3,
    cycleColumn: cols.cycleColumn,
    extraColumns: cols.extraColumns,
    detection: buildDetection(front, table, roles, units, convention, scan, cols),
  };
}

function buildDetection(front: FrontMatter, table: ParsedTable, roles: RoleAssignment, units: UnitChoice, convention: Guess<CurrentConvention>, scan: ScanRateChoice, cols: CoreColumns): ImportDetection {
  const { layout } = front;
  return {
    encoding: front.decoded.encoding,
    lineEnding: front.lineEnding,
    delimiter: layout.delimiter,
    decimalMark: layout.decimalMark,
    headerLine: front.header.guess,
    columns: roles.columns,
    potentialUnit: units.potential,
    currentUnit: units.current,
    timeUnit: units.time,
    currentConvention: convention,
    scanRate: scan.guess,
    tableLines: { first: layout.firstDataLine + 1, last: table.lastDataLine },
    rowsRead: cols.rowsKept,
    rowsSkipped: table.skippedCount + cols.rowsDropped,
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
