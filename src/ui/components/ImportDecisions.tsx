/** What the importer guessed for the selected file, why, and whether the user forced it. */
import type { Guess } from '../../state/types';
import { count, scanRate } from '../format';
import { useSelection } from './useSelection';
import { OverrideForm } from './OverrideForm';

const DELIMITERS: Record<string, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab', whitespace: 'spaces' };

function show(value: unknown): string {
  if (value === null || value === undefined) return 'none';
  // Numbers read back from the file (the scan rate) can carry a binary-float tail.
  if (typeof value === 'number') return scanRate(value);
  if (typeof value === 'string' && value in DELIMITERS) return DELIMITERS[value] as string;
  if (value === 'density') return 'current density';
  return String(value);
}

export function ImportDecisions() {
  const { file } = useSelection();
  const d = file?.measurement?.detection;
  if (!file || !d) return <p className="empty">No file selected.</p>;
  const guesses: [string, Guess<unknown>][] = [
    ['Text encoding', d.encoding], ['Line ending', d.lineEnding], ['Delimiter', d.delimiter], ['Decimal mark', d.decimalMark],
    ['Header line', d.headerLine], ['Potential unit', d.potentialUnit], ['Current unit', d.currentUnit],
    ...(d.timeUnit ? [['Time unit', d.timeUnit] as [string, Guess<unknown>]] : []),
    ['Current or density', d.currentKind],
    ['Current sign convention', d.currentConvention],
    ['Recording scale named in the file', d.reference],
    ['Scan rate (V/s)', d.scanRate],
  ];
  const block = d.headerBlock;
  const blockParts = [
    block.namesLine !== null ? `names on line ${block.namesLine}` : 'no line of names',
    block.unitsLine !== null ? `units on line ${block.unitsLine}` : null,
    block.commentLines.length ? `comment line${block.commentLines.length === 1 ? '' : 's'} ${block.commentLines.join(', ')} left out` : null,
  ].filter(Boolean);
  return (
    <div className="decisions" data-testid="import-decisions">
      <p className="summary">
        Table on lines {d.tableLines.first}–{d.tableLines.last}: {count(d.rowsRead)} rows read, {d.rowsSkipped} skipped, {d.cycleCount} cycle{d.cycleCount === 1 ? '' : 's'}.
        {' '}<span data-testid="header-block">Header block: {blockParts.join('; ')}.</span>
        {file.measurement?.densityAreaCm2 ? ` Current density × the stated area ${file.measurement.densityAreaCm2.value} cm² (line ${file.measurement.densityAreaCm2.line}) gives the current.` : ''}
      </p>
      <table className="data compact">
        <thead><tr><th scope="col">Decision</th><th scope="col">Value</th><th scope="col">Set by</th><th scope="col">Why</th></tr></thead>
        <tbody>
          {guesses.map(([label, g]) => (
            <tr key={label} data-testid={`guess-${label.toLowerCase().replace(/[^a-z]+/g, '-')}`}>
              <th scope="row">{label}</th><td>{show(g.value)}</td><td>{g.overridden ? 'you' : 'detected'}</td><td className="wrap">{g.explanation}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <table className="data compact" data-testid="column-roles">
        <thead><tr><th scope="col">#</th><th scope="col">Column</th><th scope="col">Role</th><th scope="col">Unit</th><th scope="col">Why</th></tr></thead>
        <tbody>
          {d.columns.map((c) => (
            <tr key={c.index}><td>{c.index + 1}</td><td>{c.name}</td><td>{c.role}</td><td>{c.unit || '—'}</td><td className="wrap">{c.explanation}</td></tr>
          ))}
        </tbody>
      </table>
      <OverrideForm key={file.id} file={file} />
    </div>
  );
}
