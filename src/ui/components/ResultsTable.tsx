/**
 * The results table across files: one row per file, cycle and couple of the current series (or of
 * every file), sortable by any column; a click (or Enter) on a row shows that file and cycle on
 * the trace; Copy puts the rows on the clipboard as tab-separated text with units in the header.
 * A long table draws only the rows in view (useRowWindow.ts); a hidden row of each column's
 * widest text keeps the column widths still while it scrolls.
 */
import { memo, useMemo, useState } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';
import { currentColumnsPerArea, resultsRows, resultsTsv, type ResultsColumn, type ResultsRow } from '../../state/resultsTable';
import { chooseCurrentScale } from '../plots/currentScale';
import { byNoise, DASH, fixed, scanRate } from '../format';
import { copyText } from '../clipboard';
import { SeriesHeadline } from './SeriesHeadline';
import { useSeriesScale } from './useSeriesCell';
import { useRowWindow } from './useRowWindow';
import { useHeldWhile } from './useHeldWhile';

/** Least time between two refreshes of the table's rows while files are being read (ms). */
const READING_TABLE_MS = 1000;

interface Column { id: ResultsColumn; head: string; title?: string }

export function ResultsTable() {
  const scope = useHalfwave((s) => s.resultsScope);
  const group = useHalfwave((s) => s.currentGroup());
  const sort = useHalfwave((s) => s.resultsSort);
  const selected = useHalfwave((s) => s.selectedFileId);
  const cycle = useHalfwave((s) => s.selectedCycle);
  // Keyed on the results, not on the files: files change with every progress tick of an import,
  // and a file's name and series are read with its rows (cached per result, resultsTable.ts).
  const fileOrder = useHalfwave((s) => s.fileOrder);
  // While files are read the table is refreshed once a second, not at every frame (useHeldWhile).
  const reading = useHalfwave((s) => s.importBatch !== null);
  const results = useHeldWhile(reading, useHalfwave((s) => s.results), READING_TABLE_MS);
  const scale = useSeriesScale(group);
  const [copied, setCopied] = useState<string | null>(null);
  const shownGroup = scope === 'series' ? group : null;
  const rows = useMemo(() => resultsRows({ fileOrder, files: halfwaveActions().files, results }, shownGroup, sort), [fileOrder, results, shownGroup, sort]);
  const act = halfwaveActions();
  const cur = chooseCurrentScale(Math.max(0, ...rows.map((r) => Math.max(r.ipaA ?? 0, r.ipcA ?? 0))));
  // Densities (A/cm²): the heads say so when every row is one; in a mix each density cell says so itself.
  const perArea = currentColumnsPerArea(rows);
  const ipUnit = `${cur.unit}${perArea === true ? ' cm⁻²' : ''}`;
  const markPerArea = perArea === 'mixed';
  const win = useRowWindow(rows.length);
  const windowed = win.end - win.start < rows.length;
  const widest = useMemo(() => (windowed ? widestCells(rows, cur.factor, markPerArea) : null), [rows, cur.factor, markPerArea, windowed]);
  const columns: Column[] = [
    { id: 'file', head: 'File' }, { id: 'scanRate', head: 'v / (V s⁻¹)' }, { id: 'cycle', head: 'Cycle' },
    { id: 'epa', head: `Epa / V` }, { id: 'epc', head: 'Epc / V' }, { id: 'eHalf', head: 'E½ / V' }, { id: 'deltaEp', head: 'ΔEp / mV' },
    { id: 'ipa', head: `ipa / ${ipUnit}`, ...(perArea === 'mixed' ? { title: `cells marked “/cm²” are current densities (${cur.unit} cm⁻²)` } : {}) },
    { id: 'ipc', head: `ipc / ${ipUnit}` }, { id: 'ratio', head: 'ratio', title: 'return / forward peak current' },
    { id: 'halfWidth', head: '|Ep − Ep/2| / mV', title: 'of the forward peak' }, { id: 'reading', head: 'Reading' }, { id: 'warnings', head: 'Warnings' },
  ];
  // Read the sort from the store, not from this render: two quick clicks must toggle twice.
  const sortBy = (c: ResultsColumn) => {
    const now = halfwaveActions().resultsSort;
    act.setView({ resultsSort: { column: c, descending: now?.column === c ? !now.descending : false } });
  };
  const copy = async () => {
    const ok = await copyText(resultsTsv(rows, scale.name));
    setCopied(ok ? `${rows.length} rows copied as tab-separated text` : 'The clipboard refused the text');
  };
  return (
    <div className="results" data-testid="results-across-files">
      <div className="results-bar">
        <label>
          Show{' '}
          <select value={scope} data-testid="results-scope" onChange={(e) => act.setView({ resultsScope: e.target.value === 'all' ? 'all' : 'series' })}>
            <option value="series">series “{group ?? DASH}”</option>
            <option value="all">every file</option>
          </select>
        </label>
        <button type="button" data-testid="results-copy" disabled={rows.length === 0} onClick={() => void copy()}>Copy as TSV</button>
        <span className="hint" role="status">{copied ?? `${rows.length} row${rows.length === 1 ? '' : 's'} · potentials vs ${scale.name}`}</span>
      </div>
      {shownGroup ? <SeriesHeadline group={shownGroup} /> : null}
      {rows.length === 0 ? <p className="empty">No couples found yet in these files.</p> : (
        <table className="data" data-testid="results-table" aria-rowcount={rows.length + 1}>
          <caption className="visually-hidden">Couples of every file, potentials vs {scale.name}</caption>
          <thead>
            <tr>
              {columns.map((c) => (
                <th key={c.id} scope="col" title={c.title} aria-sort={sort?.column === c.id ? (sort.descending ? 'descending' : 'ascending') : 'none'}>
                  <button type="button" className="sort" data-testid={`sort-${c.id}`} onClick={() => sortBy(c.id)}>{c.head}</button>
                </th>
              ))}
            </tr>
          </thead>
          <tbody ref={win.bodyRef}>
            {widest ? <tr className="sizer" aria-hidden="true">{widest.map((text, k) => (k === 0 ? <th key={k} scope="row"><span className="row-open">{text}</span></th> : <td key={k}>{text}</td>))}</tr> : null}
            {win.start > 0 ? <tr className="stand-in" aria-hidden="true" style={{ height: win.start * win.rowHeight }}><td colSpan={columns.length} /></tr> : null}
            {rows.slice(win.start, win.end).map((r, k) => (
              <ResultLine key={`${r.fileId}-${r.cycle}-${r.couple}`} r={r} index={win.start + k} factor={cur.factor} markPerArea={markPerArea} current={r.fileId === selected && r.cycle === cycle} show={act.selectFile} />
            ))}
            {win.end < rows.length ? <tr className="stand-in" aria-hidden="true" style={{ height: (rows.length - win.end) * win.rowHeight }}><td colSpan={columns.length} /></tr> : null}
          </tbody>
        </table>
      )}
    </div>
  );
}

/** A row's cells as text, in column order: the same for the drawn rows and the width-keeping row. */
function cellTexts(r: ResultsRow, factor: number, markPerArea: boolean): string[] {
  // Currents with the digits the file's noise allows; potentials to 0.1 mV.
  const ip = (v: number | null) => `${byNoise(v, r.noiseA, factor, 3)}${markPerArea && r.perArea && v !== null ? ' /cm²' : ''}`;
  return [
    r.fileName, scanRate(r.scanRateVPerS), String(r.cycle),
    fixed(r.epaV, 4), fixed(r.epcV, 4), fixed(r.eHalfV, 4), fixed(r.deltaEpV, 1, 1000),
    ip(r.ipaA), ip(r.ipcA), fixed(r.ratio, 3), fixed(r.forwardHalfWidthV, 1, 1000), r.reading, String(r.warnings),
  ];
}

/** Each column's longest text over all rows. */
function widestCells(rows: ResultsRow[], factor: number, markPerArea: boolean): string[] {
  const out: string[] = [];
  for (const r of rows) {
    const cells = cellTexts(r, factor, markPerArea);
    for (let k = 0; k < cells.length; k++) if ((cells[k] as string).length > (out[k]?.length ?? -1)) out[k] = cells[k] as string;
  }
  return out;
}

const ResultLine = memo(function ResultLine({ r, index, factor, markPerArea, current, show }: { r: ResultsRow; index: number; factor: number; markPerArea: boolean; current: boolean; show: (id: string, cycle: number) => void }) {
  const [file, v, cyc, epa, epc, eHalf, dep, ipa, ipc, ratio, halfWidth, reading, warnings] = cellTexts(r, factor, markPerArea);
  return (
    <tr data-testid="results-row" data-row="" aria-rowindex={index + 2} data-file-name={r.fileName} className={current ? 'current' : undefined} onClick={() => show(r.fileId, r.cycle)}>
      <th scope="row"><button type="button" className="row-open" aria-pressed={current} title="Show this trace" onClick={(e) => { e.stopPropagation(); show(r.fileId, r.cycle); }}>{file}</button></th>
      <td data-testid="results-v">{v}</td>
      <td>{cyc}</td>
      <td>{epa}</td><td>{epc}</td><td data-testid="results-ehalf">{eHalf}</td>
      <td data-testid="results-dep">{dep}</td>
      <td>{ipa}</td><td>{ipc}</td>
      <td>{ratio}</td><td>{halfWidth}</td>
      <td className="verdict" title={r.readingText}>{reading}</td><td>{warnings}</td>
    </tr>
  );
});
