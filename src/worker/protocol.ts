/**
 * Messages between the page and the analysis worker. Every request, progress report, result and
 * error carries the `requestId` of the request it belongs to. Columns travel as typed arrays whose
 * buffers are transferred, not copied (see `collectTransferables`).
 *
 * `RequestMap` is the single table of what the worker can do: the request `type`, its input and
 * its output. The unions below are derived from it, so adding a line there types both ends.
 */
import type { RunSeriesStepInput } from '../core/analysis/analyzeRun';
import type { RunFileResult, RunInput, RunSeriesResult } from '../core/analysis/runTypes';
import type { FindSweepSegmentsOptions, SweepSplit } from '../core/sweeps/findSweepSegments';
import type { ImportOverrides, ImportResult } from '../io/types';
import type { CvSimulationInput } from '../core/simulation/simulationTypes';
import type { RunAhead } from '../run/runInput';
import type { ExportRunInput } from './exportRun';
import type { FitOutcome, FitProgressDetail, FitRequest } from './fitRun';

export interface RequestMap {
  /** Split a potential trace into sweeps and cycles (core/sweeps/findSweepSegments). */
  segments: {
    input: { potentialV: Float64Array; options: Omit<FindSweepSegmentsOptions, 'cycleColumn'> };
    output: SweepSplit;
  };
  /**
   * Read one export file (io/importVoltammogram). `data`: a picked file's Blob, which the worker
   * reads itself (importBytes.ts), or bytes the page holds, transferred.
   */
  import: {
    /** `ahead`: the rest of the file's run, so the worker analyses the file as soon as it is read (state/runInput.ts). */
    input: { fileName: string; data: ArrayBuffer | Blob; overrides: ImportOverrides; ahead?: RunAhead };
    /** `ahead`: the run key and the file's result, when asked for and the run did not fail. */
    output: ImportResult & { sha256: string | null; ahead?: RunAheadResult };
  };
  /**
   * The per-file part of an analysis run (core/analysis/analyzeRun: analyzeRunFiles): peaks,
   * baselines, couples and verdicts of each file on the reported scale, with the potential column
   * as analysed (iR-corrected and shifted) so the plot shows what was analysed.
   */
  runFiles: {
    /** `only`: the file names to return (the rest may hold an internal standard); all when absent. */
    input: { run: RunInput; only?: string[] };
    output: RunFileResult[];
  };
  /** The per-series part of an analysis run over already analysed files (analyzeRunSeriesStep). */
  runSeries: {
    input: RunSeriesStepInput;
    output: RunSeriesResult;
  };
  /** Theoretical voltammogram (core/simulation) for overlaying on a measurement. */
  simulate: {
    input: { params: Partial<CvSimulationInput> };
    output: { potentialV: Float64Array; currentA: Float64Array };
  };
  /**
   * Whole-curve fit of a series (core/fit: fitWithComparison), with progress per iteration. The
   * fit cannot look at messages while it computes, so a cancel ends the worker that runs it
   * (fitLane.ts); in-thread, the fit stops at its next simulation.
   */
  fit: {
    input: FitRequest;
    output: FitOutcome;
  };
  /** Results sheet (CSV or JSON) of a run, through core analyzeRun and io/exportResults. */
  export: {
    input: ExportRunInput;
    output: { text: string };
  };
}

/** A file analysed where it was read: the digest of the run request used (runRequestDigest) and the file's result. */
export interface RunAheadResult {
  key: string;
  result: RunFileResult | null;
}

export type RequestType = keyof RequestMap;
export type RequestInput<K extends RequestType> = RequestMap[K]['input'];
export type RequestOutput<K extends RequestType> = RequestMap[K]['output'];

/** A request from the page: `{ type, requestId, input }`, discriminated on `type`. */
export type WorkerRequest = {
  [K in RequestType]: { type: K; requestId: number; input: RequestInput<K> };
}[RequestType];

export interface CancelMessage {
  type: 'cancel';
  requestId: number;
}

export type PageToWorker = WorkerRequest | CancelMessage;

export interface ProgressMessage {
  type: 'progress';
  requestId: number;
  /** Fraction done, 0…1. */
  fraction: number;
  /** Short human-readable stage, e.g. "parsing rows". */
  stage: string;
  /** Numbers behind the stage text, for requests that report more than a fraction (a fit's iteration and cost). */
  detail?: ProgressDetail;
}

/** What a progress report may carry beside its fraction, by the kind of work. */
export type ProgressDetail = FitProgressDetail;

export type ResultMessage = {
  [K in RequestType]: { type: 'result'; requestId: number; request: K; output: RequestOutput<K> };
}[RequestType];

/** Which error class the client should rebuild. */
export type ErrorClassName = 'ImportError' | 'AnalysisError' | 'CancelledError' | 'Error';

export interface ErrorMessage {
  type: 'error';
  requestId: number;
  errorName: ErrorClassName;
  code: string;
  message: string;
  fileName?: string;
  line?: number;
  column?: number;
}

export type WorkerToPage = ProgressMessage | ResultMessage | ErrorMessage;

/**
 * Buffers of a request that may be moved to the worker. Only the import's file bytes: they were
 * read for this request alone (a Blob is a handle, cloned at no cost). Voltammogram columns stay
 * with the page (the plot shows them), so they are copied.
 */
export function inputTransferables(request: WorkerRequest): ArrayBuffer[] {
  return request.type === 'import' && request.input.data instanceof ArrayBuffer ? [request.input.data] : [];
}

/**
 * The buffers the worker moves to the page with an answer. An import's and a file run's answers
 * come by the hundred in a batch and hold only arrays made for them (a transfer detaches a
 * buffer on the worker's side, so a cached array must never be among them:
 * test/unit/transferSafety.test.ts runs each request again after moving its answer's buffers
 * away): every buffer goes, down to the peaks' baselines. Copied instead, those made each
 * answer about twice as costly to post and to take in (measured in Chromium). Other answers keep
 * to the shallow depth of 6.
 */
export function answerTransferables(type: RequestType, output: unknown): ArrayBuffer[] {
  return collectTransferables(output, type === 'import' || type === 'runFiles' ? 16 : 6);
}

/**
 * All distinct ArrayBuffers under `value` (typed-array views, nested objects and arrays), so the
 * sender can transfer them instead of copying. Depth-limited: results are shallow trees.
 */
export function collectTransferables(value: unknown, depth = 6, into = new Set<ArrayBuffer>()): ArrayBuffer[] {
  if (depth < 0 || value === null || typeof value !== 'object') return [...into];
  if (ArrayBuffer.isView(value)) {
    if (value.buffer instanceof ArrayBuffer) into.add(value.buffer);
  } else if (value instanceof ArrayBuffer) {
    into.add(value);
  } else if (Array.isArray(value)) {
    for (const item of value) collectTransferables(item, depth - 1, into);
  } else {
    for (const item of Object.values(value)) collectTransferables(item, depth - 1, into);
  }
  return [...into];
}
