/**
 * Session files: the text a user saves to come back to exactly the same workspace later. A
 * session holds the analysis settings (with every series' cell values), the display choices and,
 * per file in workspace order, its name, SHA-256 and size (so a re-opened file is recognised),
 * its series, import overrides and own peak windows and baselines, and — when the user asks for
 * it — the original bytes in base64.
 *
 * The settings themselves are opaque JSON here: the store owns their shape and merges them onto
 * its defaults, so an older session with fewer fields still loads. This module checks the
 * envelope and everything it hands on, says exactly which field is wrong, and refuses text that
 * is not ours, is cut short, is too large, or carries keys that could reach an object's
 * prototype ("__proto__", "constructor", "prototype") — before anything in the workspace changes.
 */
import { CONVENTION_CHOICES, CURRENT_UNIT_CHOICES, DECIMAL_CHOICES, DELIMITER_CHOICES, ENCODING_CHOICES, POTENTIAL_UNIT_CHOICES, TIME_UNIT_CHOICES, type Choice } from './overrideChoices';
import type { ImportOverrides } from './types';

export const SESSION_FORMAT = 'halfwave-session';
/** Version 2: files carry their order and series; the view carries the selection. Version 1 still reads. */
export const SESSION_VERSION = 2;
/** Largest session text opened (characters): 256 MB of base64 data is about 190 MB of files. */
export const MAX_SESSION_CHARS = 256 * 1024 * 1024;

export type JsonObject = { [key: string]: unknown };

export interface SessionFileRecord {
  fileName: string;
  /** Hex SHA-256 of the original bytes, or null when it could not be computed. */
  sha256: string | null;
  sizeBytes: number;
  /** Name of the scan-rate series the file belongs to. */
  group: string;
  overrides: ImportOverrides;
  /** Per-file analysis settings (peak windows, baselines), as the store wrote them. */
  analysis: JsonObject;
  /** Original bytes, base64, present only when raw data was included. */
  dataBase64?: string;
}

export interface SessionDocument {
  format: typeof SESSION_FORMAT;
  version: number;
  /** ISO 8601 time of saving. */
  savedAt: string;
  settings: JsonObject;
  view: JsonObject;
  /** Further workbench state (plots, windows of the electrode), opaque here like `settings`. */
  workbench: JsonObject;
  files: SessionFileRecord[];
}

export type SessionErrorCode = 'NOT_JSON' | 'NOT_A_SESSION' | 'NEWER_VERSION' | 'BAD_FIELD' | 'TOO_LARGE' | 'UNSAFE_KEY';

export class SessionError extends Error {
  readonly code: SessionErrorCode;
  constructor(code: SessionErrorCode, message: string) {
    super(message);
    this.name = 'SessionError';
    this.code = code;
  }
}

export function serializeSession(doc: SessionDocument): string {
  return `${JSON.stringify(doc, null, 1)}\n`;
}

const UNSAFE_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

/** Finds a key that could reach a prototype, anywhere in the parsed text (iteratively: any depth). */
function unsafeKeyPath(root: unknown): string | null {
  const stack: Array<{ value: unknown; path: string }> = [{ value: root, path: '' }];
  while (stack.length) {
    const { value, path } = stack.pop() as { value: unknown; path: string };
    if (typeof value !== 'object' || value === null) continue;
    for (const key of Object.keys(value)) {
      const where = Array.isArray(value) ? `${path}[${key}]` : path ? `${path}.${key}` : key;
      if (UNSAFE_KEYS.has(key)) return where;
      stack.push({ value: (value as Record<string, unknown>)[key], path: where });
    }
  }
  return null;
}

function parseJson(text: string): unknown {
  if (text.length > MAX_SESSION_CHARS) {
    throw new SessionError('TOO_LARGE', `the session file is ${(text.length / 1048576).toFixed(0)} MB of text; sessions up to ${MAX_SESSION_CHARS / 1048576} MB are opened`);
  }
  try {
    return JSON.parse(text);
  } catch (err) {
    const cut = /end of (json )?input|unterminated|unexpected end/i.test((err as Error).message);
    throw new SessionError('NOT_JSON', cut ? `the session file ends too early (${(err as Error).message}); it was probably cut short while saving or copying` : `the session file is not valid JSON (${(err as Error).message})`);
  }
}

export function parseSession(text: string): SessionDocument {
  const raw = parseJson(text);
  if (!isObject(raw) || raw.format !== SESSION_FORMAT) {
    throw new SessionError('NOT_A_SESSION', `not a Halfwave session: "format" must be "${SESSION_FORMAT}"`);
  }
  const unsafe = unsafeKeyPath(raw);
  if (unsafe) throw new SessionError('UNSAFE_KEY', `the session holds a key "${unsafe.slice(unsafe.lastIndexOf('.') + 1)}" (at ${unsafe}) that is never written by Halfwave; refused`);
  if (raw.version !== 1 && raw.version !== SESSION_VERSION) {
    throw new SessionError('NEWER_VERSION', `session version ${String(raw.version)} is not supported (this app reads versions 1 and ${SESSION_VERSION})`);
  }
  if (!Array.isArray(raw.files)) throw new SessionError('BAD_FIELD', '"files" must be a list');
  for (const key of ['settings', 'view', 'workbench'] as const) {
    if (raw[key] !== undefined && !isObject(raw[key])) throw new SessionError('BAD_FIELD', `"${key}" must be an object`);
  }
  return {
    format: SESSION_FORMAT,
    version: raw.version,
    savedAt: typeof raw.savedAt === 'string' ? raw.savedAt : '',
    settings: isObject(raw.settings) ? raw.settings : {},
    view: isObject(raw.view) ? raw.view : {},
    workbench: isObject(raw.workbench) ? raw.workbench : {},
    files: raw.files.map((f, i) => parseFileRecord(f, i)),
  };
}

function parseFileRecord(f: unknown, i: number): SessionFileRecord {
  const where = `files[${i}]`;
  if (!isObject(f)) throw new SessionError('BAD_FIELD', `${where} must be an object`);
  if (typeof f.fileName !== 'string' || f.fileName === '' || f.fileName.length > 1000) throw new SessionError('BAD_FIELD', `${where}.fileName must be a non-empty text`);
  if (f.sha256 !== null && (typeof f.sha256 !== 'string' || !/^[0-9a-f]{64}$/.test(f.sha256))) {
    throw new SessionError('BAD_FIELD', `${where}.sha256 must be 64 hex digits or null`);
  }
  if (f.dataBase64 !== undefined && (typeof f.dataBase64 !== 'string' || !/^[A-Za-z0-9+/]*={0,2}$/.test(f.dataBase64))) {
    throw new SessionError('BAD_FIELD', `${where}.dataBase64 must be base64 text`);
  }
  if (f.group !== undefined && (typeof f.group !== 'string' || f.group.length > 200)) throw new SessionError('BAD_FIELD', `${where}.group must be a short text`);
  const record: SessionFileRecord = {
    fileName: f.fileName,
    sha256: f.sha256,
    sizeBytes: typeof f.sizeBytes === 'number' && Number.isFinite(f.sizeBytes) && f.sizeBytes >= 0 ? f.sizeBytes : 0,
    group: typeof f.group === 'string' && f.group.trim() !== '' ? f.group : 'series 1',
    overrides: parseOverrides(f.overrides, `${where}.overrides`),
    analysis: isObject(f.analysis) ? f.analysis : {},
  };
  if (typeof f.dataBase64 === 'string') record.dataBase64 = f.dataBase64;
  return record;
}

/** Import overrides, each checked against the importer's own table of choices. */
function parseOverrides(v: unknown, where: string): ImportOverrides {
  if (v === undefined) return {};
  if (!isObject(v)) throw new SessionError('BAD_FIELD', `${where} must be an object`);
  const out: ImportOverrides = {};
  const choice = <T>(key: keyof ImportOverrides, choices: readonly Choice<T>[]) => {
    if (v[key] === undefined) return;
    if (!choices.some((c) => c.value === v[key])) throw new SessionError('BAD_FIELD', `${where}.${key} must be one of ${choices.map((c) => JSON.stringify(c.value)).join(', ')}`);
    (out as Record<string, unknown>)[key] = v[key];
  };
  choice('delimiter', DELIMITER_CHOICES);
  choice('decimalMark', DECIMAL_CHOICES);
  choice('encoding', ENCODING_CHOICES);
  choice('currentConvention', CONVENTION_CHOICES);
  choice('potentialUnit', POTENTIAL_UNIT_CHOICES);
  choice('currentUnit', CURRENT_UNIT_CHOICES);
  choice('timeUnit', TIME_UNIT_CHOICES);
  for (const key of ['headerLine', 'potentialColumn', 'currentColumn', 'timeColumn', 'cycleColumn'] as const) {
    if (v[key] === undefined) continue;
    const n = v[key];
    if (typeof n !== 'number' || !Number.isInteger(n) || n < -1 || n > 1_000_000) throw new SessionError('BAD_FIELD', `${where}.${key} must be a whole number`);
    out[key] = n;
  }
  if (v.scanRateVPerS !== undefined) {
    const r = v.scanRateVPerS;
    if (typeof r !== 'number' || !Number.isFinite(r) || r <= 0) throw new SessionError('BAD_FIELD', `${where}.scanRateVPerS must be a positive number`);
    out.scanRateVPerS = r;
  }
  return out;
}

function isObject(v: unknown): v is JsonObject {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Base64 of bytes, in chunks so large files do not overflow the argument list. */
export function encodeBase64(bytes: Uint8Array): string {
  let binary = '';
  const chunk = 0x8000;
  for (let i = 0; i < bytes.length; i += chunk) {
    binary += String.fromCharCode(...bytes.subarray(i, i + chunk));
  }
  return btoa(binary);
}

export function decodeBase64(text: string): Uint8Array<ArrayBuffer> {
  let binary: string;
  try {
    binary = atob(text);
  } catch {
    throw new SessionError('BAD_FIELD', 'dataBase64 is not valid base64');
  }
  const out = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) out[i] = binary.charCodeAt(i);
  return out;
}
