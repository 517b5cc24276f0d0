/**
 * Errors across the worker boundary. A thrown error becomes an `ErrorMessage` (class name, code,
 * message, file position) and is rebuilt on the page as the same class, so callers can rely on
 * `instanceof AnalysisError` / `ImportError` and on `code` whether the work ran in a worker or
 * in-thread.
 */
import { AnalysisError, type AnalysisErrorCode } from '../core/errors';
import { ImportError, type ImportErrorCode } from '../io/errors';
import type { ErrorMessage } from './protocol';

/** The request was cancelled by the caller before it finished. */
export class CancelledError extends Error {
  readonly code = 'CANCELLED';
  constructor(message = 'cancelled') {
    super(message);
    this.name = 'CancelledError';
  }
}

/**
 * The worker that was doing the request stopped (it crashed, ran out of memory, or was shut down)
 * before it answered; the request itself may well be fine and can be sent again.
 */
export class WorkerLostError extends Error {
  readonly code = 'WORKER_LOST';
  constructor(message = 'the analysis worker stopped before it answered') {
    super(message);
    this.name = 'WorkerLostError';
  }
}

interface ErrorFields {
  name?: unknown;
  code?: unknown;
  message?: unknown;
  fileName?: unknown;
  line?: unknown;
  column?: unknown;
}

/** Describes any thrown value as an error message for `requestId`. */
export function describeError(requestId: number, err: unknown): ErrorMessage {
  const e = (typeof err === 'object' && err !== null ? err : { message: String(err) }) as ErrorFields;
  const name = e.name === 'ImportError' || e.name === 'AnalysisError' || e.name === 'CancelledError' ? e.name : 'Error';
  const msg: ErrorMessage = {
    type: 'error',
    requestId,
    errorName: name,
    code: typeof e.code === 'string' ? e.code : 'INTERNAL',
    message: typeof e.message === 'string' && e.message !== '' ? e.message : 'unexpected failure in the analysis worker',
  };
  if (typeof e.fileName === 'string') msg.fileName = e.fileName;
  if (typeof e.line === 'number') msg.line = e.line;
  if (typeof e.column === 'number') msg.column = e.column;
  return msg;
}

/** Rebuilds the error class an `ErrorMessage` describes. */
export function reviveError(msg: ErrorMessage): Error {
  switch (msg.errorName) {
    case 'AnalysisError':
      return new AnalysisError(msg.code as AnalysisErrorCode, msg.message);
    case 'CancelledError':
      return new CancelledError(msg.message);
    case 'ImportError':
      return reviveImportError(msg);
    default: {
      const err = new Error(msg.message) as Error & { code: string };
      err.code = msg.code;
      return err;
    }
  }
}

function reviveImportError(msg: ErrorMessage): ImportError {
  const where: { line?: number; column?: number } = {};
  if (msg.line !== undefined) where.line = msg.line;
  if (msg.column !== undefined) where.column = msg.column;
  const err = new ImportError(msg.code as ImportErrorCode, msg.fileName ?? '', msg.message, where);
  // The message already names the file and position; the constructor would prefix them again.
  err.message = msg.message;
  return err;
}
