/** "Cell": electrode, solution and reference-scale values used by the calculations. */
import { displayScale, referenceChoices } from '../../state/display';
import { halfwaveActions, useHalfwave } from '../../state/react';
import type { AnalysisSettings } from '../../state/types';
import { NumberField } from './NumberField';
import { SelectField } from './SelectField';

type Chem = AnalysisSettings['chemistry'];
type Ref = AnalysisSettings['reference'];

const refOptions = referenceChoices.map((r) => ({ value: r.id, label: r.label }));

export function CellPanel() {
  const s = useHalfwave((st) => st.settings);
  const act = halfwaveActions();
  const chem = (patch: Partial<Chem>) => void act.updateSettings((x) => ({ ...x, chemistry: { ...x.chemistry, ...patch } }));
  const ref = (patch: Partial<Ref>) => void act.updateSettings((x) => ({ ...x, reference: { ...x.reference, ...patch } }));
  const c = s.chemistry;
  const r = s.reference;
  const scale = displayScale(s);
  const fileNote = referenceChoices.find((x) => x.id === r.fileReference)?.note;
  return (
    <section className="panel cell" aria-labelledby="cell-title">
      <h2 id="cell-title">Cell</h2>
      <div className="field-grid two">
        <NumberField label="n" unit="electrons" value={c.electronCount} min={1} max={10} testId="electron-count" onCommit={(v) => v !== null && chem({ electronCount: v })} />
        <NumberField label="Area" unit="cm²" value={c.areaCm2} min={1e-9} testId="area" onCommit={(v) => v !== null && chem({ areaCm2: v })} />
        <NumberField label="Concentration" unit="mM" value={c.concentrationMM} min={1e-9} testId="concentration" onCommit={(v) => v !== null && chem({ concentrationMM: v })} />
        <NumberField label="Temperature" unit="°C" value={c.temperatureC} min={-60} max={200} testId="temperature" onCommit={(v) => v !== null && chem({ temperatureC: v })} />
        <NumberField label="α" placeholder="from the data" value={c.alpha} min={0.05} max={0.95} allowEmpty title="transfer coefficient for the irreversible and Laviron analyses; leave empty to take it from the data (0.5 when it cannot be measured)" onCommit={(v) => chem({ alpha: v })} />
        <NumberField label="Ru" unit="Ω" value={c.resistanceOhm} min={0} title="uncompensated resistance; potentials are corrected by −i·Ru before analysis" testId="resistance" onCommit={(v) => v !== null && chem({ resistanceOhm: v })} />
      </div>
      <h3>Potential scale</h3>
      <div className="field-grid">
        <SelectField label="Files recorded vs" value={r.fileReference} options={refOptions} testId="file-reference" onChange={(v) => ref({ fileReference: v })} />
        <SelectField label="Show and export vs" value={r.displayReference} options={refOptions} testId="display-reference" onChange={(v) => ref({ displayReference: v })} />
        {r.fileReference === 'RHE' || r.displayReference === 'RHE' ? (
          <NumberField label="pH" value={r.pH} min={-2} max={16} testId="ph" onCommit={(v) => v !== null && ref({ pH: v })} />
        ) : null}
        {r.displayReference === 'Fc' || r.fileReference === 'Fc' ? (
          <NumberField label="Measured E½ of ferrocene" unit="V vs file scale" value={r.ferroceneHalfWaveV} allowEmpty
            title="leave empty to use a typical literature value (marked as such)" onCommit={(v) => ref({ ferroceneHalfWaveV: v })} />
        ) : null}
      </div>
      <p className={scale.ok ? 'hint' : 'warn-text'} data-testid="scale-basis">{scale.basis}</p>
      {fileNote ? <p className="hint">{fileNote}</p> : null}
    </section>
  );
}
