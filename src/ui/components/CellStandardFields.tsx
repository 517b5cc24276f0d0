/**
 * The scale a series was recorded on and, when needed, its internal standard: a Fc⁺/Fc E½ typed
 * in, or measured in one of the loaded files (the couple nearest a given potential). A bare wire
 * or Ag/Ag⁺ can be converted only through such a standard; a mercury electrode gets its caution.
 */
import { referenceChoices } from '../../state/display';
import { useHalfwave, useHalfwaveShallow } from '../../state/react';
import type { ResolvedCell, SeriesCell } from '../../state/types';
import { NumberField } from './NumberField';
import { OriginBadge } from './OriginBadge';
import { SelectField } from './SelectField';

const refOptions = referenceChoices.map((r) => ({ value: r.id, label: r.label }));
const MERCURY = new Set(['SCE', 'NCE', 'calomel-0.1M', 'SSCE', 'MSE-sat', 'MSE-1M-H2SO4', 'HgO-1M', 'HgO-0.1M']);

type Mode = 'none' | 'value' | 'measured';

export function CellStandardFields({ resolved, set }: { resolved: ResolvedCell; set: (patch: Partial<SeriesCell>) => void }) {
  const c = resolved.cell;
  const displayReference = useHalfwave((s) => s.settings.reference.displayReference);
  const fileNames = useHalfwaveShallow((s) => s.fileOrder.map((id) => s.files[id]?.fileName ?? ''));
  const floating = c.fileReference === 'pseudo' || c.fileReference === 'AgAg+';
  const mode: Mode = c.internalStandardNearV !== null ? 'measured' : c.ferroceneHalfWaveV !== null ? 'value' : 'none';
  const needsStandard = floating || displayReference === 'Fc' || c.fileReference === 'Fc';
  const chooseMode = (m: Mode) => set(m === 'none' ? { ferroceneHalfWaveV: null, internalStandardNearV: null, internalStandardFile: null }
    : m === 'value' ? { internalStandardNearV: null, internalStandardFile: null, ferroceneHalfWaveV: c.ferroceneHalfWaveV ?? 0 }
      : { ferroceneHalfWaveV: null, internalStandardNearV: c.internalStandardNearV ?? 0 });
  return (
    <div className="field-grid">
      <div className="with-origin">
        <SelectField label="Files recorded vs" value={c.fileReference} options={refOptions} testId="file-reference" onChange={(v) => set({ fileReference: v })} />
        <OriginBadge origin={resolved.origin.fileReference} evidence={resolved.evidence.fileReference} testId="origin-fileReference" />
      </div>
      {c.fileReference === 'RHE' || displayReference === 'RHE' ? (
        <NumberField label="pH" value={c.pH} min={-2} max={16} testId="ph" onCommit={(v) => v !== null && set({ pH: v })} />
      ) : null}
      {needsStandard ? (
        <>
          <SelectField<Mode> label="Fc⁺/Fc internal standard" value={mode} testId="standard-mode" onChange={chooseMode}
            options={[{ value: 'none', label: floating ? 'none (no conversion possible)' : 'none (a typical value, marked)' }, { value: 'value', label: 'E½ typed in' }, { value: 'measured', label: 'measured in a file' }]} />
          {mode === 'value' ? (
            <NumberField label="E½ of ferrocene" unit="V vs recording scale" value={c.ferroceneHalfWaveV} testId="ferrocene-ehalf" onCommit={(v) => v !== null && set({ ferroceneHalfWaveV: v })} />
          ) : null}
          {mode === 'measured' ? (
            <>
              <SelectField label="Ferrocene measured in" value={c.internalStandardFile ?? ''} testId="standard-file" onChange={(v) => set({ internalStandardFile: v || null })}
                options={[{ value: '', label: "this series' own files" }, ...[...new Set(fileNames)].map((n) => ({ value: n, label: n }))]} />
              <NumberField label="its couple near" unit="V, recording scale" value={c.internalStandardNearV} testId="standard-near" onCommit={(v) => v !== null && set({ internalStandardNearV: v })} />
            </>
          ) : null}
        </>
      ) : null}
      {floating && mode === 'none' ? <p className="warn-text" data-testid="floating-reference">A {c.fileReference === 'pseudo' ? 'bare wire' : 'Ag/Ag⁺ electrode'} has no fixed potential: potentials stay on it until ferrocene measured in the same solution gives the Fc⁺/Fc scale.</p> : null}
      {MERCURY.has(c.fileReference) ? <p className="hint">Calomel, mercurous-sulfate and Hg/HgO electrodes contain mercury: handle, store and dispose of them as your lab's rules say (see Bench safety).</p> : null}
    </div>
  );
}
