/**
 * The results sheet (the CSV that io/exportResults.ts writes) as the sheets of a workbook: one
 * sheet per series with the rows of every table that belong to it (by its `series` column, or by
 * its `file` column through the files' series), a sheet of the files (name, series, size,
 * SHA-256, layout and the rest of each '# file' line), and a sheet of the method and parameters
 * (every other '#' line). The cells are the CSV's own, numbers as numbers, so the workbook and the
 * CSV cannot disagree. Pure: text in, rows out; the XLSX bytes are written in the UI.
 */
import { splitFields } from './textLines';

export type WorkbookCell = string | number | null;

export interface WorkbookSheet {
  name: string;
  rows: WorkbookCell[][];
}

/** Numbers as numbers, empty fields as empty cells, anything else as text. */
function value(text: string): WorkbookCell {
  if (text === '') return null;
  return /^-?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(text) ? Number(text) : text;
}

interface Table { title: string; head: string[]; rows: string[][] }

function parseSheet(csv: string): { meta: string[][]; files: string[][]; tables: Table[] } {
  const meta: string[][] = [];
  const files: string[][] = [];
  const tables: Table[] = [];
  let current: Table | null = null;
  for (const line of csv.split(/\r?\n/)) {
    if (line.trim() === '') { current = null; continue; }
    const cells = splitFields(line, ',');
    const first = cells[0] ?? '';
    if (first.startsWith('# table: ')) { current = { title: first.slice(9), head: [], rows: [] }; tables.push(current); continue; }
    if (first === '# file') { files.push(cells.slice(1)); continue; }
    if (first.startsWith('#')) { meta.push([first.replace(/^#\s*/, ''), ...cells.slice(1)]); continue; }
    if (current && current.head.length === 0) current.head = cells;
    else if (current) current.rows.push(cells);
  }
  return { meta, files, tables };
}

/** "# file,a.csv,series,S,role,series,size_bytes,123,…" → name, then key/value pairs. */
function fileRecords(files: string[][]): { head: string[]; rows: WorkbookCell[][]; seriesOf: Map<string, string> } {
  const keys: string[] = [];
  const records = files.map(([name, ...rest]) => {
    const r: Record<string, string> = {};
    for (let i = 0; i + 1 < rest.length; i += 2) {
      const k = rest[i] as string;
      if (!keys.includes(k)) keys.push(k);
      r[k] = rest[i + 1] as string;
    }
    return { name: name ?? '', r };
  });
  const seriesOf = new Map(records.map((x) => [x.name, x.r.series ?? '']));
  return { head: ['file', ...keys], rows: records.map((x) => [x.name, ...keys.map((k) => value(x.r[k] ?? ''))]), seriesOf };
}

/** Excel's rules for sheet names: ≤ 31 characters, none of : \ / ? * [ ], unique (case-insensitive). */
export function sheetName(wanted: string, taken: Set<string>): string {
  const base = (wanted.replace(/[:\\/?*[\]]/g, '_').trim() || 'series').slice(0, 31);
  let name = base;
  for (let k = 2; taken.has(name.toLowerCase()); k++) name = `${base.slice(0, 31 - String(k).length - 1)}~${k}`;
  taken.add(name.toLowerCase());
  return name;
}

export function resultsWorkbook(csv: string): WorkbookSheet[] {
  const { meta, files, tables } = parseSheet(csv);
  const f = fileRecords(files);
  const seriesNames = [...new Set(f.seriesOf.values())].filter((s) => s !== '');
  const taken = new Set<string>(['files', 'method and parameters']);
  const perSeries = seriesNames.map((series) => {
    const rows: WorkbookCell[][] = [[`series: ${series}`]];
    for (const t of tables) {
      const sCol = t.head.indexOf('series');
      const fCol = t.head.indexOf('file');
      const mine = t.rows.filter((r) => (sCol >= 0 ? r[sCol] === series : fCol >= 0 ? f.seriesOf.get(r[fCol] ?? '') === series : true));
      if (mine.length === 0) continue;
      rows.push([], [t.title], t.head, ...mine.map((r) => r.map(value)));
    }
    return { name: sheetName(series, taken), rows };
  });
  return [
    ...perSeries,
    { name: 'files', rows: [f.head, ...f.rows] },
    { name: 'method and parameters', rows: meta.map((r) => r.map((c, i) => (i === 0 ? c : value(c)))) },
  ];
}
