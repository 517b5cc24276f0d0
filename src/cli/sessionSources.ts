/**
 * `analyze --session FILE`: the files given on the command line analysed exactly as a saved
 * workbench session has them — its method settings, each series' cell values, each file's series,
 * peak windows and baseline choices, the display scale and the sign convention. The session is
 * laid over the files through the screen's own mapping (state/runInput.ts), so the command line
 * and the screen give the same numbers. Files are matched to the session's records by SHA-256,
 * else by name; a file the session does not know is grouped as `analyze` groups files.
 */
import { groupIntoSeries } from '../io';
import { parseSession, SessionError, type SessionFileRecord } from '../io/session';
import type { RunSources } from '../run/runInput';
import { defaultSettings, emptyFileSettings, mergeFileSettings, mergeSeriesCells, mergeSettings } from '../run/settings';
import { UsageError } from './errors';
import type { InputsRead } from './readInputs';

export interface SessionSources {
  sources: RunSources;
  /** What the session did not cover, in words. */
  notes: string[];
}

export function sessionSources(read: InputsRead, sessionText: string, sessionPath: string): SessionSources {
  let doc;
  try {
    doc = parseSession(sessionText);
  } catch (err) {
    if (err instanceof SessionError) throw new UsageError(`${sessionPath}: ${err.message}`);
    throw err;
  }
  const notes: string[] = [];
  const records = doc.files;
  const recordOf = (name: string, sha256: string): SessionFileRecord | undefined =>
    records.find((r) => r.sha256 === sha256) ?? records.find((r) => r.fileName === name);
  const unmatched = read.files.filter((f) => !recordOf(f.measurement.fileName, f.sha256));
  const groups = groupIntoSeries(unmatched.map((f) => ({ name: f.measurement.fileName, folder: f.folder })));
  const autoGroup = new Map(groups.flatMap((g) => g.members.map((i) => [unmatched[i]!, g.key] as const)));
  const sources: RunSources = {
    files: {}, fileOrder: [], fileSettings: {},
    settings: mergeSettings(defaultSettings, doc.settings), seriesCells: mergeSeriesCells(doc.settings.seriesCells),
    convention: doc.view.convention === 'polarographic' ? 'polarographic' : 'iupac',
  };
  read.files.forEach((f, i) => {
    const id = `file-${i + 1}`;
    const record = recordOf(f.measurement.fileName, f.sha256);
    if (record && record.sha256 !== null && record.sha256 !== f.sha256) notes.push(`${f.path}: matched to the session by name only; its bytes differ from the saved file's`);
    if (!record) notes.push(`${f.path}: not in the session; grouped as analyze groups files, with the session's defaults`);
    sources.fileOrder.push(id);
    sources.files[id] = {
      fileName: f.measurement.fileName, group: record?.group ?? autoGroup.get(f) ?? 'series 1', measurement: f.measurement,
      sizeBytes: f.sizeBytes, sha256: f.sha256, warnings: f.warnings,
    };
    sources.fileSettings[id] = record ? mergeFileSettings(record.analysis) : emptyFileSettings;
  });
  for (const r of records) {
    if (!read.files.some((f) => f.sha256 === r.sha256 || f.measurement.fileName === r.fileName)) notes.push(`the session names ${r.fileName}, which was not given`);
  }
  return { sources, notes };
}
