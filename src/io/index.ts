/** Public face of the importer: what the worker, the store and the CLI may use. */
export { importVoltammogram, importVoltammogramAsync } from './importVoltammogram';
export type { AsyncImportOptions, ImportInput } from './importVoltammogram';
export { importBatch } from './importBatch';
export type { BatchFile, BatchItem, BatchOptions } from './importBatch';
export { ImportError } from './errors';
export type { ImportErrorCode, ImportWarning, ImportWarningCode } from './errors';
export { parseUnitOf, CURRENT_FACTORS, POTENTIAL_FACTORS, TIME_FACTORS } from './units';
export { delimiterName } from './detectFormat';
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
