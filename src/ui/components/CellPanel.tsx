/**
 * "Cell": electrode, solution and recording reference of the series on screen (the selected
 * file's series, or the one chosen in the Series view), plus the global display scale. Every value
 * says where it came from (the default, a file's header, or entered), with the evidence on hover.
 * With no file loaded it edits the defaults new series start from.
 */
import { referenceChoices } from '../../state/display';
import { halfwaveActions, useHalfwave } from '../../state/react';
import type { CellField, ResolvedCell, SeriesCell } from '../../state/types';
import { CellBlankFields } from './CellBlankFields';
import { CellKineticsFields } from './CellKineticsFields';
import { CellStandardFields } from './CellStandardFields';
import { NumberField, type NumberFieldProps } from './NumberField';
import { OriginBadge } from './OriginBadge';
import { SelectField } from './SelectField';
import { useAdsorbedSeries, useSeriesCell, useSeriesScale } from './useSeriesCell';

const refOptions = referenceChoices.map((r) => ({ value: r.id, label: r.label }));

function editCell(group: string | null, patch: Partial<SeriesCell>): void {
  const act = halfwaveActions();
  if (group !== null) {
    void act.updateSeriesCell(group, (own) => ({ ...own, ...patch }));
    return;
  }
  const { fileReference, pH, ferroceneHalfWaveV, internalStandardNearV, internalStandardFile, ...chemistry } = patch;
  const given = { fileReference, pH, ferroceneHalfWaveV, internalStandardNearV, internalStandardFile };
  const reference = Object.fromEntries(Object.entries(given).filter(([, v]) => v !== undefined));
  void act.updateSettings((x) => ({ ...x, chemistry: { ...x.chemistry, ...chemistry }, reference: { ...x.reference, ...reference } }));
}

/** A number field with the origin of its value beside it. */
function CellNumber({ resolved, field, ...props }: NumberFieldProps & { resolved: ResolvedCell; field: CellField }) {
  return (
    <div className="with-origin">
      <NumberField {...props} />
      <OriginBadge origin={resolved.origin[field]} evidence={resolved.evidence[field]} testId={`origin-${field}`} />
    </div>
  );
}

/** Area of a disk from its diameter and back: A = π d²/4 (d in mm, A in cm²). */
const diameterMm = (areaCm2: number) => Number((Math.sqrt((4 * areaCm2) / Math.PI) * 10).toPrecision(4));
const areaOfDiameter = (dMm: number) => Number(((Math.PI * (dMm / 10) ** 2) / 4).toPrecision(6));

export function CellPanel() {
  const group = useHalfwave((s) => s.currentGroup());
  const resolved = useSeriesCell(group);
  const displayReference = useHalfwave((s) => s.settings.reference.displayReference);
  const scale = useSeriesScale(group);
  const adsorbed = useAdsorbedSeries(group);
  const defaultsUsed = useHalfwave((s) => (group ? s.series[group]?.result?.defaultsUsed : undefined));
  const c = resolved.cell;
  const set = (patch: Partial<SeriesCell>) => editCell(group, patch);
  const count = resolved.fileCount;
  const fileNote = referenceChoices.find((x) => x.id === c.fileReference)?.note;
  return (
    <section className="panel cell" aria-labelledby="cell-title">
      <h2 id="cell-title">Cell</h2>
      <p className="cell-scope" data-testid="cell-series">
        {group === null ? 'Defaults for new series (no file loaded)' : `Cell of series '${group}' (${count} file${count === 1 ? '' : 's'})`}
      </p>
      <div className="field-grid two">
        <CellNumber resolved={resolved} field="electronCount" label="n" unit="electrons" value={c.electronCount} min={1} max={12} testId="electron-count" onCommit={(v) => v !== null && set({ electronCount: v })} />
        <CellNumber resolved={resolved} field="temperatureC" label="Temperature" unit="°C" value={c.temperatureC} min={-60} max={200} testId="temperature" onCommit={(v) => v !== null && set({ temperatureC: v })} />
        <CellNumber resolved={resolved} field="areaCm2" label="Area" unit="cm²" value={c.areaCm2} min={1e-9} testId="area" title="geometric or electroactive area of the working electrode" onCommit={(v) => v !== null && set({ areaCm2: v })} />
        <NumberField label="or disk diameter" unit="mm" value={diameterMm(c.areaCm2)} min={1e-4} max={100} testId="diameter" title="a disk electrode's diameter; sets the area to π d²/4" onCommit={(v) => v !== null && set({ areaCm2: areaOfDiameter(v) })} />
        <CellNumber resolved={resolved} field="concentrationMM" label="Concentration" unit="mM" value={c.concentrationMM} min={1e-9} testId="concentration" title="bulk concentration of the dissolved analyte (not used for an adsorbed film)" onCommit={(v) => v !== null && set({ concentrationMM: v })} />
        <CellNumber resolved={resolved} field="resistanceOhm" label="Ru" unit="Ω" value={c.resistanceOhm} min={0} title="uncompensated resistance; potentials are corrected by −i·Ru before analysis (0: not corrected)" testId="resistance" onCommit={(v) => v !== null && set({ resistanceOhm: v })} />
        <NumberField label="u(A)" unit="%" value={c.areaUncertaintyPercent} min={0} max={50} testId="area-uncertainty" title="relative standard uncertainty of the area, carried into D's second interval" onCommit={(v) => v !== null && set({ areaUncertaintyPercent: v })} />
        <NumberField label="u(C)" unit="%" value={c.concentrationUncertaintyPercent} min={0} max={50} testId="concentration-uncertainty" title="relative standard uncertainty of the concentration, carried into D's second interval" onCommit={(v) => v !== null && set({ concentrationUncertaintyPercent: v })} />
        <CellNumber resolved={resolved} field="alpha" label="αc" unit="of the reduction" placeholder="from the data" value={c.alpha} min={0.05} max={0.95} allowEmpty testId="alpha"
          title="αc, the cathodic transfer coefficient (of the reduction O + ne⁻ → R; an oxidation wave runs with 1 − αc); leave empty to measure it from a totally irreversible series, else 0.5 with 0.3–0.7 carried into D and k°" onCommit={(v) => set({ alpha: v })} />
      </div>
      {adsorbed ? <p className="hint" data-testid="cell-adsorbed">Adsorbed film: Γ follows from the peak charge and the area; the concentration is not used.</p> : null}
      <CellKineticsFields resolved={resolved} set={set} />
      <CellStandardFields resolved={resolved} set={set} />
      {group !== null ? <CellBlankFields group={group} cell={c} set={set} /> : null}
      {group !== null ? <CellOrigins resolved={resolved} group={group} /> : null}
      {defaultsUsed?.length ? (
        <ul className="warn-text defaults-used" data-testid="defaults-used">
          {defaultsUsed.map((d) => <li key={d.field}>{d.affects.join(', ')} rest on a default: {d.value}.</li>)}
        </ul>
      ) : null}
      <h3>Potential scale (all series)</h3>
      <div className="field-grid">
        <SelectField label="Show and export vs" value={displayReference} options={refOptions} testId="display-reference"
          onChange={(v) => void halfwaveActions().updateSettings((x) => ({ ...x, reference: { ...x.reference, displayReference: v } }))} />
      </div>
      <p className={scale.ok && !/typical/.test(scale.basis) ? 'hint' : 'warn-text'} data-testid="scale-basis">{scale.basis}</p>
      {fileNote ? <p className="hint">{fileNote}</p> : null}
    </section>
  );
}

/** Disagreements between the series' files, and a way back to the files' and the default values. */
function CellOrigins({ resolved, group }: { resolved: ResolvedCell; group: string }) {
  const entered = Object.values(resolved.origin).includes('entered');
  return (
    <div className="cell-origins" data-testid="cell-origins">
      {entered ? (
        <p className="hint">
          Values entered for this series override its files and the defaults.{' '}
          <button type="button" data-testid="cell-reset" title="Forget the values entered for this series; use the files’ headers, else the defaults"
            onClick={() => void halfwaveActions().updateSeriesCell(group, () => ({}))}>Reset</button>
        </p>
      ) : null}
      {resolved.notes.map((n) => <p key={n} className="warn-text">{n}</p>)}
    </div>
  );
}
