/**
 * Groups files into scan-rate series the same way on screen and on the command line: by the
 * folder they came from, then, inside a folder, by their common file-name stem when the folder
 * plainly holds several experiments (at least two stems with two files each). A stem is the name
 * without its extension, scan-rate tokens ("50mVs", "0.1 V/s", "v=0.1Vs"), run numbers and
 * separators: "probe_RuHex_050mVs.csv" and "probe_RuHex_100mVs.csv" share "probe_RuHex".
 * Series are named after the folder, or the stem when a folder is split, made unique.
 */

/** 'auto': folder, then stem; 'folder': folder only; 'stem': stem only; 'one': every file in one series. */
export type SeriesGrouping = 'auto' | 'folder' | 'stem' | 'one';

export const SERIES_GROUPINGS: readonly SeriesGrouping[] = ['auto', 'folder', 'stem', 'one'];

export interface NamedFile {
  name: string;
  /** Folder the file came from; null for a loose file. */
  folder: string | null;
}

export interface SeriesGroup {
  key: string;
  /** Indices into the input list, in input order. */
  members: number[];
}

const SCAN_RATE_TOKEN = /(?:v\s*=\s*)?\d+(?:[.,p]\d+)?\s*(?:[mµu]?v)\s*(?:[/·_-]?\s*s(?:ec)?(?:\^?-1|⁻¹)?)(?![a-z])/giu;
const EQUALS_TOKEN = /\bv\s*=\s*\d+(?:[.,]\d+)?/giu;

/** "probe_RuHex_050mVs.csv" → "probe_RuHex"; "" when nothing but numbers remain. */
export function fileStem(name: string): string {
  const base = name.replace(/^.*[\\/]/, '').replace(/\.[A-Za-z0-9]{1,5}$/, '');
  return base
    .replace(SCAN_RATE_TOKEN, ' ')
    .replace(EQUALS_TOKEN, ' ')
    .replace(/(?<![a-z])(?:run|scan|rep|file|no)[\s_-]*\d+/giu, ' ')
    .replace(/\d+/g, ' ')
    .replace(/[\s_.,;()[\]{}+-]+/g, '_')
    .replace(/^_+|_+$/g, '');
}

function byKey(indices: number[], keyOf: (i: number) => string): Map<string, number[]> {
  const out = new Map<string, number[]>();
  for (const i of indices) out.set(keyOf(i), [...(out.get(keyOf(i)) ?? []), i]);
  return out;
}

/** The stems split a folder only when at least two of them hold two files or more. */
function splitByStem(indices: number[], files: NamedFile[]): Map<string, number[]> | null {
  const stems = byKey(indices, (i) => fileStem(files[i]!.name).toLowerCase());
  return [...stems.values()].filter((m) => m.length >= 2).length >= 2 ? stems : null;
}

function displayStem(members: number[], files: NamedFile[]): string {
  return fileStem(files[members[0]!]!.name);
}

function unique(groups: Array<{ name: string; members: number[] }>): SeriesGroup[] {
  const seen = new Map<string, number>();
  return groups.map((g) => {
    const base = g.name || 'series';
    const n = (seen.get(base) ?? 0) + 1;
    seen.set(base, n);
    return { key: n === 1 ? base : `${base} (${n})`, members: g.members };
  });
}

export function groupIntoSeries(files: NamedFile[], by: SeriesGrouping = 'auto'): SeriesGroup[] {
  const all = files.map((_, i) => i);
  if (!files.length) return [];
  if (by === 'one') return [{ key: commonName(all, files), members: all }];
  if (by === 'stem') return unique([...byKey(all, (i) => fileStem(files[i]!.name).toLowerCase()).values()].map((m) => ({ name: displayStem(m, files), members: m })));
  const groups: Array<{ name: string; members: number[] }> = [];
  for (const [folder, members] of byKey(all, (i) => files[i]!.folder ?? '')) {
    const split = by === 'auto' ? splitByStem(members, files) : null;
    if (split) groups.push(...[...split.values()].map((m) => ({ name: displayStem(m, files), members: m })));
    else groups.push({ name: folder || commonName(members, files), members });
  }
  return unique(groups);
}

/** A name for files that form one series: their folder, else their common stem, else "series 1". */
function commonName(members: number[], files: NamedFile[]): string {
  const folders = new Set(members.map((i) => files[i]!.folder));
  const [folder] = folders;
  if (folders.size === 1 && folder) return folder;
  const stems = new Set(members.map((i) => fileStem(files[i]!.name)));
  const [stem] = stems;
  return stems.size === 1 && stem ? stem : 'series 1';
}
