/**
 * "Cell": electrode, solution and recording reference of the series on screen (the selected
 * file's series, or the one chosen in the Series view), plus the global display scale. With no
 * file loaded it edits the defaults new series start from.
 */
import { referenceChoices } from '../../state/display';
import { halfwaveActions, useHalfwave } from '../../state/react';
import type { CellField, ResolvedCell, SeriesCell } from '../../state/types';
import { NumberField } from './NumberField';
import { SelectField } from './SelectField';
import { useAdsorbedSeries, useSeriesCell, useSeriesScale } from './useSeriesCell';

const refOptions = referenceChoices.map((r) => ({ value: r.id, label: r.label }));

const FIELD_WORDS: Record<CellField, string> = {
  electronCount: 'n', areaCm2: 'area', concentrationMM: 'concentration', temperatureC: 'temperature', alpha: 'α',
  resistanceOhm: 'Ru', fileReference: 'reference electrode', pH: 'pH', ferroceneHalfWaveV: 'ferrocene E½',
};

function editCell(group: string | null, patch: Partial<SeriesCell>): void {
  const act = halfwaveActions();
  if (group !== null) {
    void act.updateSeriesCell(group, (own) => ({ ...own, ...patch }));
    return;
  }
  const { fileReference, pH, ferroceneHalfWaveV, ...chemistry } = patch;
  const reference = { ...(fileReference !== undefined ? { fileReference } : {}), ...(pH !== undefined ? { pH } : {}), ...(ferroceneHalfWaveV !== undefined ? { ferroceneHalfWaveV } : {}) };
  void act.updateSettings((x) => ({ ...x, chemistry: { ...x.chemistry, ...chemistry }, reference: { ...x.reference, ...reference } }));
}

export function CellPanel() {
  const group = useHalfwave((s) => s.currentGroup());
  const resolved = useSeriesCell(group);
  const displayReference = useHalfwave((s) => s.settings.reference.displayReference);
  const scale = useSeriesScale(group);
  const adsorbed = useAdsorbedSeries(group);
  const c = resolved.cell;
  const set = (patch: Partial<SeriesCell>) => editCell(group, patch);
  const fileNote = referenceChoices.find((x) => x.id === c.fileReference)?.note;
  const count = resolved.fileCount;
  return (
    <section className="panel cell" aria-labelledby="cell-title">
      <h2 id="cell-title">Cell</h2>
      <p className="cell-scope" data-testid="cell-series">
        {group === null ? 'Defaults for new series (no file loaded)' : `Cell of series '${group}' (${count} file${count === 1 ? '' : 's'})`}
      </p>
      <div className="field-grid two">
        <NumberField label="n" unit="electrons" value={c.electronCount} min={1} max={10} testId="electron-count" onCommit={(v) => v !== null && set({ electronCount: v })} />
        <NumberField label="Area" unit="cm²" value={c.areaCm2} min={1e-9} testId="area" title="geometric or electroactive area of the working electrode" onCommit={(v) => v !== null && set({ areaCm2: v })} />
        <NumberField label="Concentration" unit="mM" value={c.concentrationMM} min={1e-9} testId="concentration" title="bulk concentration of the dissolved analyte (not used for an adsorbed film)" onCommit={(v) => v !== null && set({ concentrationMM: v })} />
        <NumberField label="Temperature" unit="°C" value={c.temperatureC} min={-60} max={200} testId="temperature" onCommit={(v) => v !== null && set({ temperatureC: v })} />
        <NumberField label="αc" unit="cathodic transfer coeff." placeholder="from the data" value={c.alpha} min={0.05} max={0.95} allowEmpty testId="alpha" title="αc, the cathodic transfer coefficient (of the reduction O + ne⁻ → R; an oxidation wave runs with 1 − αc); leave empty to measure it from a totally irreversible series, else 0.5 with 0.3–0.7 carried into D and k°" onCommit={(v) => set({ alpha: v })} />
        <NumberField label="Ru" unit="Ω" value={c.resistanceOhm} min={0} title="uncompensated resistance; potentials are corrected by −i·Ru before analysis" testId="resistance" onCommit={(v) => v !== null && set({ resistanceOhm: v })} />
      </div>
      {adsorbed ? <p className="hint" data-testid="cell-adsorbed">Adsorbed film: Γ follows from the peak charge and the area; the concentration is not used.</p> : null}
      <div className="field-grid">
        <SelectField label="Files recorded vs" value={c.fileReference} options={refOptions} testId="file-reference" onChange={(v) => set({ fileReference: v })} />
        {c.fileReference === 'RHE' || displayReference === 'RHE' ? (
          <NumberField label="pH" value={c.pH} min={-2} max={16} testId="ph" onCommit={(v) => v !== null && set({ pH: v })} />
        ) : null}
        {displayReference === 'Fc' || c.fileReference === 'Fc' ? (
          <NumberField label="Measured E½ of ferrocene" unit="V vs file scale" value={c.ferroceneHalfWaveV} allowEmpty
            title="leave empty to use a typical literature value (marked as such)" onCommit={(v) => set({ ferroceneHalfWaveV: v })} />
        ) : null}
      </div>
      {group !== null ? <CellOrigins resolved={resolved} group={group} /> : null}
      <h3>Potential scale (all series)</h3>
      <div className="field-grid">
        <SelectField label="Show and export vs" value={displayReference} options={refOptions} testId="display-reference"
          onChange={(v) => void halfwaveActions().updateSettings((x) => ({ ...x, reference: { ...x.reference, displayReference: v } }))} />
      </div>
      <p className={scale.ok ? 'hint' : 'warn-text'} data-testid="scale-basis">{scale.basis}</p>
      {fileNote ? <p className="hint">{fileNote}</p> : null}
    </section>
  );
}

/** Where the series' values came from, disagreements between its files, and a way back. */
function CellOrigins({ resolved, group }: { resolved: ResolvedCell; group: string }) {
  const fields = Object.keys(FIELD_WORDS) as CellField[];
  const named = (o: string) => fields.filter((k) => resolved.origin[k] === o).map((k) => FIELD_WORDS[k]).join(', ');
  const fromFiles = named('files');
  const entered = named('series');
  return (
    <div className="cell-origins" data-testid="cell-origins">
      {fromFiles ? <p className="hint">From the files’ headers: {fromFiles}.</p> : null}
      {entered ? (
        <p className="hint">
          Set for this series: {entered}.{' '}
          <button type="button" data-testid="cell-reset" title="Forget the values entered for this series; use the files’ headers, else the defaults"
            onClick={() => void halfwaveActions().updateSeriesCell(group, () => ({}))}>Reset</button>
        </p>
      ) : null}
      {resolved.notes.map((n) => <p key={n} className="warn-text">{n}</p>)}
    </div>
  );
}
