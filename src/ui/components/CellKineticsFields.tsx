/**
 * What the irreversible and forward-peak kinetics may need beyond the cell: the electrons in the
 * rate-determining step nₐ (the equations use α·nₐ) and an E°′ known from elsewhere (a totally
 * irreversible couple has no E½ to give it; with it, k° follows from the forward peak alone).
 * Both belong to the series; E°′ is stated on the series' recording scale and follows the display scale.
 */
import { referenceChoices } from '../../state/display';
import type { ResolvedCell, SeriesCell } from '../../state/types';
import { NumberField } from './NumberField';
import { OriginBadge } from './OriginBadge';

export function CellKineticsFields({ resolved, set }: { resolved: ResolvedCell; set: (patch: Partial<SeriesCell>) => void }) {
  const c = resolved.cell;
  const scaleName = referenceChoices.find((r) => r.id === c.fileReference)?.label ?? c.fileReference;
  const given = c.formalPotentialV !== null || c.transferElectronCount !== 1;
  return (
    <details className="cell-kinetics" open={given} data-testid="cell-kinetics">
      <summary>Slow-electron-transfer inputs{given ? ' (set)' : ''}</summary>
      <div className="field-grid two">
        <div className="with-origin">
          <NumberField label="nₐ" unit="in the rate-determining step" value={c.transferElectronCount} min={0.5} max={10} testId="transfer-electron-count"
            title="electrons transferred in the rate-determining step; the irreversible peak equations use α·nₐ (1 for a one-electron step)"
            onCommit={(v) => v !== null && set({ transferElectronCount: v })} />
          <OriginBadge origin={resolved.origin.transferElectronCount} evidence={resolved.evidence.transferElectronCount} testId="origin-transferElectronCount" />
        </div>
        <div className="with-origin">
          <NumberField label="E°′ known" unit={`V vs ${scaleName}`} value={c.formalPotentialV} min={-10} max={10} allowEmpty placeholder="not known" testId="formal-potential"
            title="formal potential measured elsewhere (e.g. from a slower scan or another method), on the scale the files were recorded on; a totally irreversible couple then gets k° from its forward peak"
            onCommit={(v) => set({ formalPotentialV: v })} />
          <OriginBadge origin={resolved.origin.formalPotentialV} evidence={resolved.evidence.formalPotentialV} testId="origin-formalPotentialV" />
        </div>
      </div>
    </details>
  );
}
