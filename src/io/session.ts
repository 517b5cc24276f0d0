/**
 * Session files: the text a user saves to come back to the same analysis later. A session holds
 * the analysis settings, the display choices and, per file, its name, SHA-256 and size (so a
 * re-opened file can be recognised), the import overrides and per-file analysis settings, and —
 * only when the user asks for it — the original bytes in base64.
 *
 * The settings themselves are opaque JSON here: the store owns their shape and merges them onto
 * its defaults, so an older session with fewer fields still loads. This module checks only the
 * envelope and says exactly which field is wrong when it is not a session.
 */
import type { ImportOverrides } from './types';

export const SESSION_FORMAT = 'halfwave-session';
export const SESSION_VERSION = 1;

export type JsonObject = { [key: string]: unknown };

export interface SessionFileRecord {
  fileName: string;
  /** Hex SHA-256 of the original bytes, or null when it could not be computed. */
  sha256: string | null;
  sizeBytes: number;
  /** Name of the scan-rate series group the file belongs to. */
  group: string;
  overrides: ImportOverrides;
  /** Per-file analysis settings (peak windows, baselines), as the store wrote them. */
  analysis: JsonObject;
  /** Original bytes, base64, present only when raw data was included. */
  dataBase64?: string;
}

export interface SessionDocument {
  format: typeof SESSION_FORMAT;
  version: typeof SESSION_VERSION;
  /** ISO 8601 time of saving. */
  savedAt: string;
  settings: JsonObject;
  view: JsonObject;
  files: SessionFileRecord[];
}

export type SessionErrorCode = 'NOT_JSON' | 'NOT_A_SESSION' | 'NEWER_VERSION' | 'BAD_FIELD';

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

export function parseSession(text: string): SessionDocument {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (err) {
    throw new SessionError('NOT_JSON', `the session file is not valid JSON (${(err as Error).message})`);
  }
  if (!isObject(raw) || raw.format !== SESSION_FORMAT) {
    throw new SessionError('NOT_A_SESSION', `not a Halfwave session: "format" must be "${SESSION_FORMAT}"`);
  }
  if (raw.version !== SESSION_VERSION) {
    throw new SessionError('NEWER_VERSION', `session version ${String(raw.version)} is not supported (this app reads version ${SESSION_VERSION})`);
  }
  if (!Array.isArray(raw.files)) throw new SessionError('BAD_FIELD', '"files" must be a list');
  return {
    format: SESSION_FORMAT,
    version: SESSION_VERSION,
    savedAt: typeof raw.savedAt === 'string' ? raw.savedAt : '',
    settings: isObject(raw.settings) ? raw.settings : {},
    view: isObject(raw.view) ? raw.view : {},
    files: raw.files.map((f, i) => parseFileRecord(f, i)),
  };
}

function parseFileRecord(f: unknown, i: number): SessionFileRecord {
  const where = `files[${i}]`;
  if (!isObject(f)) throw new SessionError('BAD_FIELD', `${where} must be an object`);
  if (typeof f.fileName !== 'string' || f.fileName === '') throw new SessionError('BAD_FIELD', `${where}.fileName must be a non-empty text`);
  if (f.sha256 !== null && (typeof f.sha256 !== 'string' || !/^[0-9a-f]{64}$/.test(f.sha256))) {
    throw new SessionError('BAD_FIELD', `${where}.sha256 must be 64 hex digits or null`);
  }
  if (f.dataBase64 !== undefined && typeof f.dataBase64 !== 'string') throw new SessionError('BAD_FIELD', `${where}.dataBase64 must be text`);
  const record: SessionFileRecord = {
    fileName: f.fileName,
    sha256: f.sha256,
    sizeBytes: typeof f.sizeBytes === 'number' && f.sizeBytes >= 0 ? f.sizeBytes : 0,
    group: typeof f.group === 'string' && f.group !== '' ? f.group : 'series 1',
    overrides: isObject(f.overrides) ? (f.overrides as ImportOverrides) : {},
    analysis: isObject(f.analysis) ? f.analysis : {},
  };
  if (typeof f.dataBase64 === 'string') record.dataBase64 = f.dataBase64;
  return record;
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

export function decodeBase64(text: string): Uint8Array {
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
