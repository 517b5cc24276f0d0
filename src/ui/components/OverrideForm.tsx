/** Force any of the importer's guesses for one file and read it again. */
import { useState } from 'react';
import type { CurrentUnit, FileEntry, ImportOverrides, PotentialUnit } from '../../state/types';
import { halfwaveActions } from '../../state/react';


type Draft = ImportOverrides;
const AUTO = '';

function pickOne<K extends keyof Draft>(draft: Draft, key: K, raw: string, parse: (s: string) => Draft[K]): Draft {
  const next = { ...draft };
  if (raw === AUTO) delete next[key];
  else next[key] = parse(raw);
  return next;
}

export function OverrideForm({ file }: { file: FileEntry }) {
  const [draft, setDraft] = useState<Draft>(file.overrides);
  const columns = file.measurement?.detection.columns ?? [];
  const sel = <K extends keyof Draft>(key: K, label: string, options: [string, string][], parse: (s: string) => Draft[K], testId?: string) => (
    <label className="field">
      {label}
      <select data-testid={testId} value={draft[key] === undefined ? AUTO : String(draft[key])} onChange={(e) => setDraft(pickOne(draft, key, e.target.value, parse))}>
        <option value={AUTO}>as detected</option>
        {options.map(([v, l]) => <option key={v} value={v}>{l}</option>)}
      </select>
    </label>
  );
  const colOptions: [string, string][] = columns.map((c) => [String(c.index), `${c.index + 1}: ${c.name}`]);
  const act = halfwaveActions();
  return (
    <form className="override-form" aria-label="Override the importer" onSubmit={(e) => { e.preventDefault(); void act.reimportFile(file.id, draft); }}>
      <fieldset>
        <legend>Read this file differently</legend>
        {sel('delimiter', 'Delimiter', [[',', 'comma'], [';', 'semicolon'], ['\t', 'tab'], ['whitespace', 'spaces']], (s) => s as Draft['delimiter'])}
        {sel('decimalMark', 'Decimal mark', [['.', 'point'], [',', 'comma']], (s) => s as Draft['decimalMark'])}
        {sel('potentialColumn', 'Potential column', colOptions, Number, 'override-potential-column')}
        {sel('currentColumn', 'Current column', colOptions, Number, 'override-current-column')}
        {sel('timeColumn', 'Time column', colOptions, Number)}
        {sel('potentialUnit', 'Potential unit', (['V', 'mV', 'µV'] as PotentialUnit[]).map((u) => [u, u]), (s) => s as PotentialUnit, 'override-potential-unit')}
        {sel('currentUnit', 'Current unit', (['A', 'mA', 'µA', 'nA', 'pA'] as CurrentUnit[]).map((u) => [u, u]), (s) => s as CurrentUnit, 'override-current-unit')}
        {sel('currentConvention', 'Current sign in file', [['iupac', 'anodic positive (IUPAC)'], ['polarographic', 'cathodic positive']], (s) => s as Draft['currentConvention'], 'override-current-convention')}
        {sel('encoding', 'Text encoding', [['utf-8', 'UTF-8'], ['utf-16le', 'UTF-16 LE'], ['utf-16be', 'UTF-16 BE'], ['latin1', 'Latin-1']], (s) => s as Draft['encoding'])}
        {sel('cycleColumn', 'Cycles from', [['-1', 'the potential trace (ignore any cycle column)'], ...colOptions], Number)}
        <label className="field">
          Header line (0 = none)
          <input
            inputMode="numeric"
            data-testid="override-header-line"
            defaultValue={draft.headerLine === undefined ? '' : String(draft.headerLine)}
            onBlur={(e) => {
              const v = Number(e.target.value);
              setDraft(pickOne(draft, 'headerLine', e.target.value.trim() === '' || !Number.isInteger(v) || v < 0 ? AUTO : String(v), Number));
            }}
          />
        </label>
        <label className="field">
          Scan rate (mV/s)
          <input
            inputMode="decimal"
            data-testid="override-scan-rate"
            defaultValue={draft.scanRateVPerS === undefined ? '' : String(Number((draft.scanRateVPerS * 1000).toPrecision(6)))}
            onBlur={(e) => {
              const v = Number(e.target.value.replace(',', '.'));
              setDraft(pickOne(draft, 'scanRateVPerS', e.target.value.trim() === '' || !(v > 0) ? AUTO : String(v / 1000), Number));
            }}
          />
        </label>
      </fieldset>
      <div className="buttons">
        <button type="submit" data-testid="reimport">Read again with these choices</button>
        <button type="button" onClick={() => { setDraft({}); void act.reimportFile(file.id, {}); }}>Back to detected</button>
      </div>
    </form>
  );
}
