/**
 * What the worker does for each request type: a thin table over io/ and core/. The same table runs
 * inside the worker (analysis.worker.ts) and in-thread (client.ts), so Vitest exercises exactly the
 * code the browser runs.
 */
import { analyzeRunFiles, analyzeRunSeriesStep } from '../core/analysis/analyzeRun';
import { simulateCv } from '../core/simulation/simulateCv';
import { findSweepSegments } from '../core/sweeps/findSweepSegments';
import { importVoltammogramAsync } from '../io';
import { CancelledError } from './errors';
import { exportRun } from './exportRun';
import { importBytes } from './importBytes';
import { runFitRequest } from './fitRun';
import type { ImportResult } from '../io/types';
import { fileRunRequest, runAheadSources, runRequestDigest, type RunAhead } from '../run/runInput';
import type { ProgressDetail, RequestInput, RequestOutput, RequestType, RunAheadResult } from './protocol';

export interface HandlerContext {
  /** Report progress, 0…1, with a short stage text (and its numbers). Throws CancelledError once cancelled. */
  progress(fraction: number, stage: string, detail?: ProgressDetail): void;
  /** Aborted when the caller cancels; long handlers stop at their next turn. */
  signal: AbortSignal;
}

type Handler<K extends RequestType> = (input: RequestInput<K>, ctx: HandlerContext) => RequestOutput<K> | Promise<RequestOutput<K>>;

export const handlers: { [K in RequestType]: Handler<K> } = {
  segments: (input) => findSweepSegments(input.potentialV, input.options),
  import: async (input, ctx) => {
    const data = await importBytes(input.fileName, input.data);
    // Web Crypto copies the bytes when digest() is called (W3C Web Cryptography API, digest(),
    // step 2), so the hash runs beside the reading, on the browser's own thread.
    const hashing = sha256Hex(data);
    hashing.catch(() => undefined);
    ctx.progress(0, 'reading');
    // The async form yields between chunks, so a cancel message is seen mid-file.
    const result = await importVoltammogramAsync(input.fileName, data, {
      overrides: input.overrides,
      signal: ctx.signal,
      onProgress: (fraction: number) => ctx.progress(fraction, 'reading rows'),
    });
    const sha256 = await hashing;
    const ahead = input.ahead ? runAhead(input.ahead, input.fileName, result, sha256) : undefined;
    return { ...result, sha256, ...(ahead ? { ahead } : {}) };
  },
  runFiles: (input) => analyzeRunFiles(input.run, input.only),
  runSeries: (input) => analyzeRunSeriesStep(input),
  export: (input) => ({ text: exportRun(input) }),
  // The core checks the signal before every simulation (AnalysisError CANCELLED, which runHandler turns into CancelledError).
  fit: (input, ctx) => runFitRequest(input, { signal: ctx.signal, onProgress: (fraction, stage, detail) => ctx.progress(fraction, stage, detail) }),
  simulate: (input) => {
    const sim = simulateCv(input.params);
    return { potentialV: sim.potentialV, currentA: sim.currentA };
  },
};

/**
 * The file's run, made from the page's snapshot and the file just read, by the same request
 * builder the page uses. A run that fails is left to the page, which runs it again and shows why.
 */
function runAhead(ahead: RunAhead, fileName: string, read: ImportResult, sha256: string | null): RunAheadResult | undefined {
  try {
    const request = fileRunRequest(runAheadSources(ahead, { fileName, measurement: read.measurement, sha256, warnings: read.warnings }), ahead.fileId);
    const key = runRequestDigest(request);
    return { key, result: analyzeRunFiles(request.run, request.only)[0] ?? null };
  } catch {
    return undefined;
  }
}

/** Hex SHA-256 of the bytes (FIPS 180-4), or null where Web Crypto is unavailable. */
export async function sha256Hex(data: ArrayBuffer | Uint8Array<ArrayBuffer>): Promise<string | null> {
  const subtle = globalThis.crypto?.subtle as SubtleCrypto | undefined;
  if (!subtle) return null;
  const digest = new Uint8Array(await subtle.digest('SHA-256', data));
  return Array.from(digest, (b) => b.toString(16).padStart(2, '0')).join('');
}

/** Runs the handler; any failure after the signal was aborted becomes CancelledError. */
export async function runHandler<K extends RequestType>(type: K, input: RequestInput<K>, ctx: HandlerContext): Promise<RequestOutput<K>> {
  const handler = handlers[type] as Handler<K>;
  try {
    ctx.signal.throwIfAborted();
    return await handler(input, ctx);
  } catch (err) {
    if (ctx.signal.aborted) throw new CancelledError();
    throw err;
  }
}
