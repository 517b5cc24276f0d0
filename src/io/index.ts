/** Public face of the importer: what the worker, the store and the CLI may use. */
export { importVoltammogram, importVoltammogramAsync } from './importVoltammogram';
export type { AsyncImportOptions, ImportInput } from './importVoltammogram';
export { importBatch } from './importBatch';
export type { BatchFile, BatchItem, BatchOptions } from './importBatch';
export { ImportError } from './errors';
export type { ImportErrorCode, ImportWarning, ImportWarningCode } from './errors';
export { parseUnitOf, CURRENT_FACTORS, POTENTIAL_FACTORS, TIME_FACTORS } from './units';
export type {
  ColumnRole,
  CurrentConvention,
  CurrentKind,
  CurrentUnit,
  DecimalMark,
  Delimiter,
  DetectedColumn,
  Guess,
  ImportDetection,
  ImportOptions,
  ImportOverrides,
  ImportResult,
  Measurement,
  PotentialUnit,
  PreambleValue,
  TextEncoding,
  TimeUnit,
} from './types';
export { describeLayout } from './describeLayout';
export {
  CONVENTION_CHOICES, CURRENT_UNIT_CHOICES, DECIMAL_CHOICES, DELIMITER_CHOICES, ENCODING_CHOICES, POTENTIAL_UNIT_CHOICES, TIME_UNIT_CHOICES,
  choiceNamed, choiceNames, labelOf,
} from './overrideChoices';
export type { Choice } from './overrideChoices';
export { fileStem, groupIntoSeries, SERIES_GROUPINGS } from './groupIntoSeries';
export type { NamedFile, SeriesGroup, SeriesGrouping } from './groupIntoSeries';
export { cellFromHeaders, referenceIdOf } from './cellFromHeaders';
export type { HeaderCell } from './cellFromHeaders';
export { runContract } from './runContract';
export type { RunContract } from './runContract';
export { fitContract, PARAMETER_NAMES, shortLabel, shortName, summariseComparison } from './fitContract';
export type { ComparisonSummary } from './fitContract';
