/**
 * Reads the files named on the command line (a folder stands for the files in it, sorted
 * naturally: run2 before run10; "-" is standard input) and imports each through the importer.
 * Each file is read once: its size and SHA-256 come from the same bytes the importer reads.
 * An unreadable path is a UsageError naming it. A file the importer rejects is an ImportError;
 * with `keepGoing` it is collected instead and the other files are still read.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { basename, join, resolve } from 'node:path';
import { sha256Hex } from '../core/provenance/sha256';
import { importVoltammogram, ImportError } from '../io';
import { naturalCompare } from '../io/naturalOrder';
import type { ImportOverrides, ImportResult, ImportWarning, Measurement } from '../io';
import { UsageError } from './errors';

export interface ReadInputsOptions {
  overrides?: ImportOverrides;
  /** Collect ImportErrors per file instead of throwing the first. @default false */
  keepGoing?: boolean;
}

export type InputOutcome = { path: string; result: ImportResult } | { path: string; error: ImportError };

/** A file that was read and imported, with what the results sheet needs to trace it. */
export interface ReadFile {
  /** As given on the command line (a folder's files as folder/name; "-" for standard input). */
  path: string;
  /** The folder it was found in when a folder was named; null for files named one by one. */
  folder: string | null;
  sizeBytes: number;
  sha256: string;
  measurement: Measurement;
  warnings: ImportWarning[];
}

export interface InputsRead {
  measurements: Measurement[];
  /** The files that were read, parallel to `measurements`. */
  files: ReadFile[];
  warnings: ImportWarning[];
  failures: ImportError[];
  /** One entry per file, in reading order. */
  outcomes: InputOutcome[];
}


/** Expands folders into their files (not recursive; hidden files and *.md notes left out). */
export function expandPaths(paths: string[]): string[] {
  return expandInputs(paths).map((e) => e.path);
}

/** expandPaths, with the folder each file was found in (null for files named one by one). */
export function expandInputs(paths: string[]): Array<{ path: string; folder: string | null }> {
  const out: Array<{ path: string; folder: string | null }> = [];
  for (const p of paths) {
    if (p === '-') {
      out.push({ path: p, folder: null });
      continue;
    }
    let st;
    try {
      st = statSync(p);
    } catch {
      throw new UsageError(`cannot read "${p}": no such file or folder`);
    }
    if (!st.isDirectory()) {
      out.push({ path: p, folder: null });
      continue;
    }
    const names = readdirSync(p)
      .filter((n) => !n.startsWith('.') && !/\.md$/i.test(n))
      .filter((n) => statSync(join(p, n)).isFile())
      .sort(naturalCompare);
    if (!names.length) throw new UsageError(`the folder "${p}" holds no data files`);
    // Named by its own name, also when given as "." or "..".
    const folder = basename(resolve(p)) || p;
    out.push(...names.map((n) => ({ path: join(p, n), folder })));
  }
  return out;
}

export function readInputs(paths: string[], options: ReadInputsOptions = {}): InputsRead {
  if (!paths.length) throw new UsageError('no input files given (see --help)');
  const read: InputsRead = { measurements: [], files: [], warnings: [], failures: [], outcomes: [] };
  for (const { path, folder } of expandInputs(paths)) {
    let bytes: Uint8Array;
    try {
      // "-" is standard input, so that `halfwave simulate ... | halfwave analyze - --inspect` works.
      bytes = readFileSync(path === '-' ? 0 : path);
    } catch (err) {
      throw new UsageError(`cannot read "${path}": ${(err as NodeJS.ErrnoException).code ?? String(err)}`);
    }
    // Hash before importing: the digest must see the bytes exactly as read.
    const sha256 = sha256Hex(bytes);
    try {
      const result = importVoltammogram(path === '-' ? 'stdin' : basename(path), bytes, options.overrides ? { overrides: options.overrides } : {});
      read.measurements.push(result.measurement);
      read.files.push({ path, folder, sizeBytes: bytes.length, sha256, measurement: result.measurement, warnings: result.warnings });
      read.warnings.push(...result.warnings);
      read.outcomes.push({ path, result });
    } catch (err) {
      if (!(err instanceof ImportError) || !options.keepGoing) throw err;
      read.failures.push(err);
      read.outcomes.push({ path, error: err });
    }
  }
  return read;
}
