/**
 * The detection report of `analyze --inspect`: for each file, what the importer guessed and why
 * (encoding, line ends, delimiter, decimal mark, header, column roles and units, rows read and
 * skipped, cycles, scan rate and its source), then its warnings. Text for people, JSON for scripts.
 */
import type { InputOutcome } from './readInputs';
import type { ImportResult } from '../io';

const LABEL_WIDTH = 13;
const row = (label: string, text: string) => `  ${label.padEnd(LABEL_WIDTH)}${text}\n`;
/** The explanations start by naming their subject ("delimiter semicolon — ..."); the label already does. */
const strip = (text: string, subject: string) => (text.startsWith(`${subject} `) ? text.slice(subject.length + 1) : text);

export function formatInspectText(outcomes: InputOutcome[]): string {
  return outcomes.map((o) => ('error' in o ? `file: ${o.path}\n  error (${o.error.code}): ${o.error.message}\n` : formatOne(o.path, o.result))).join('\n');
}

function formatOne(path: string, r: ImportResult): string {
  const m = r.measurement;
  const d = m.detection;
  let out = `file: ${path}\n`;
  out += row('encoding', strip(d.encoding.explanation, 'encoding'));
  out += row('line ends', strip(d.lineEnding.explanation, 'line endings'));
  out += row('delimiter', strip(d.delimiter.explanation, 'delimiter'));
  out += row('decimal mark', strip(d.decimalMark.explanation, 'decimal mark'));
  out += row('header', strip(d.headerLine.explanation, 'header'));
  d.columns.forEach((c, i) => {
    out += row(i === 0 ? 'columns' : '', `${String(c.index + 1).padStart(2)} ${JSON.stringify(c.name)} → ${c.role}${c.unit ? ` [${c.unit}]` : ''} — ${strip(c.explanation.replace(`${c.role} — `, ''), c.role)}`);
  });
  out += row('units', [d.potentialUnit.explanation, d.currentUnit.explanation, d.timeUnit?.explanation].filter(Boolean).join('; '));
  out += row('convention', strip(d.currentConvention.explanation, 'current convention'));
  const footer = d.footer.lines ? `; ${d.footer.lines} footer line(s) from line ${d.footer.firstLine} left out` : '';
  out += row('rows', `${d.rowsRead} read, ${d.rowsSkipped} skipped (table on lines ${d.tableLines.first}–${d.tableLines.last}${footer})`);
  out += row('cycles', `${d.cycleCount} (${m.segments.length} sweeps)`);
  out += row('scan rate', `${strip(d.scanRate.explanation, 'scan rate')}${m.scanRateSource ? ` [source: ${m.scanRateSource}]` : ''}`);
  out += row('reference', strip(d.reference.explanation, 'reference'));
  out += row('current kind', d.currentKind.explanation);
  const extras = [
    m.temperatureK ? `temperature ${(m.temperatureK.value - 273.15).toFixed(2)} °C (line ${m.temperatureK.line})` : '',
    m.areaCm2 ? `area ${+m.areaCm2.value.toPrecision(6)} cm² (line ${m.areaCm2.line}${/π d²\/4/.test(m.areaCm2.text) ? `: ${m.areaCm2.text}` : ''})` : '',
    m.concentrationMolPerCm3 ? `concentration ${+(m.concentrationMolPerCm3.value * 1e6).toPrecision(6)} mM (line ${m.concentrationMolPerCm3.line})` : '',
  ].filter(Boolean);
  if (extras.length) out += row('preamble', extras.join('; '));
  const md = Object.entries(m.metadata);
  if (md.length) out += row('metadata', md.map(([k, v]) => `${k} = ${v}`).join('; '));
  r.warnings.forEach((w, i) => {
    out += row(i === 0 ? 'warnings' : '', `[${w.code}] ${w.message}`);
  });
  return out;
}

/** Plain JSON of the same report (no sample arrays). */
export function inspectJson(outcomes: InputOutcome[]): unknown {
  return outcomes.map((o) => {
    if ('error' in o) return { file: o.path, error: { code: o.error.code, message: o.error.message, line: o.error.line ?? null, column: o.error.column ?? null } };
    const m = o.result.measurement;
    return {
      file: o.path,
      id: m.id,
      detection: m.detection,
      segments: m.segments.length,
      scanRateVPerS: m.scanRateVPerS,
      scanRateSource: m.scanRateSource,
      currentConvention: m.currentConvention,
      referenceElectrode: m.referenceElectrode,
      currentKind: m.currentKind,
      densityAreaCm2: m.densityAreaCm2,
      temperatureK: m.temperatureK,
      areaCm2: m.areaCm2,
      concentrationMolPerCm3: m.concentrationMolPerCm3,
      metadata: m.metadata,
      extraColumns: Object.keys(m.extraColumns),
      warnings: o.result.warnings,
    };
  });
}
