/** "Use these values": the fitted values the series' cell has a field for go into it as one step, which Undo takes back. */
import { useMemo } from 'react';
import { carryableValues } from '../../state/fitRequest';
import { halfwaveActions, useHalfwave } from '../../state/react';

export function FitCarry({ group, current }: { group: string; current: boolean }) {
  const result = useHalfwave((s) => s.fits[group]?.result ?? null);
  const values = useMemo(() => (result ? carryableValues(result) : []), [result]);
  const carried = useHalfwave((s) => s.fits[group]?.carried ?? null);
  const canUndo = useHalfwave((s) => !!carried && s.past.length === carried.historyDepth);
  const act = halfwaveActions();
  const text = (vs: typeof values) => vs.map((v) => `${v.label} = ${v.value}${v.unit ? ` ${v.unit}` : ''}`).join(', ');
  return (
    <section className="fit-carry" aria-labelledby="fit-carry-title">
      <h3 id="fit-carry-title">Use these values</h3>
      {carried ? (
        <p data-testid="fit-carried">
          {text(carried.values)} went into the cell of “{group}”; its files were analysed again.{' '}
          {canUndo ? <button type="button" data-testid="fit-undo" onClick={() => void act.undoFitValues(group)}>Undo</button> : null}
        </p>
      ) : values.length ? (
        <p>
          <button type="button" data-testid="fit-use" disabled={!current} onClick={() => void act.useFitValues(group)}>Use these values</button>{' '}
          puts {text(values)} into the cell of “{group}” (Undo takes them back).
        </p>
      ) : (
        <p className="hint">Nothing to carry: the cell takes α (one couple) and R_u, and only where the fit estimated them.</p>
      )}
      <p className="hint">E°′, k°, D, k_f, Γ, k_s and C_dl have no field in the cell; they stay here and go into the results sheet.</p>
    </section>
  );
}
