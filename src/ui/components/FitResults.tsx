/** A finished fit: what was fitted, the parameters, the strongest correlations, the model-choice advice, the notes and "use these values". */
import { useMemo } from 'react';
import { fitParameterRows, strongestCorrelations } from '../../state/fitView';
import { useHalfwave } from '../../state/react';
import type { FitEntry } from '../../state/types';
import { fixed, sci } from '../format';
import { FitCarry } from './FitCarry';
import { FitComparison } from './FitComparison';
import { FitParameterTable } from './FitParameterTable';

export function FitResults({ group }: { group: string }) {
  const entry = useHalfwave((s) => s.fits[group]);
  const current = useHalfwave((s) => s.fitIsCurrent(group));
  const result = entry?.status === 'ready' ? entry.result : null;
  const rows = useMemo(() => (result && entry ? fitParameterRows(result, entry.scale.name) : []), [result, entry]);
  const pairs = useMemo(() => (result ? strongestCorrelations(result, 3) : []), [result]);
  if (!entry || !result) return null;
  return (
    <div className="fit-results" data-testid="fit-results">
      <p className="fit-summary" data-testid="fit-summary">{summary(entry)}</p>
      {current ? null : (
        <p className="warn-text" role="note" data-testid="fit-outdated">The files, the cell or the potential scale of this series changed after this fit: fit again before you use or export it.</p>
      )}
      <FitParameterTable rows={rows} several={result.values.couples.length > 1} />
      <p className="hint">Standard errors and intervals come from the noise about this fit alone. Something the model leaves out (an R_u held at 0 Ω while the cell has some, a background) moves the values by more than they show.</p>
      <div className="fit-aside">
        <section aria-labelledby="fit-corr-title">
          <h3 id="fit-corr-title">Strongest correlations</h3>
          {pairs.length ? (
            <ul className="fit-list" data-testid="fit-correlations">
              {pairs.map((c) => <li key={`${c.a}|${c.b}`}>{c.a} and {c.b}: {c.rho >= 0 ? '+' : '−'}{Math.abs(c.rho).toFixed(2)}</li>)}
            </ul>
          ) : <p className="hint">Only one parameter was fitted.</p>}
          <p className="hint">Near ±1: the data fix a combination of the two rather than each one; their errors are then large together.</p>
        </section>
        <FitComparison entry={entry} />
      </div>
      {result.notes.length ? (
        <section aria-labelledby="fit-notes-title">
          <h3 id="fit-notes-title">What the fit says about itself</h3>
          <ul className="fit-list" data-testid="fit-notes">{result.notes.map((n) => <li key={n}>{n}</li>)}</ul>
        </section>
      ) : null}
      <FitCarry group={group} current={current} />
    </div>
  );
}

function summary(entry: FitEntry): string {
  const r = entry.result;
  if (!r) return '';
  const files = entry.fileNames.length;
  const lo = fixed(Math.min(...r.windowV), 3);
  const hi = fixed(Math.max(...r.windowV), 3);
  const couples = `${r.values.couples.length} couple${r.values.couples.length > 1 ? 's' : ''}`;
  const fitted = files > 1 ? `${files} files fitted together` : 'one file';
  const outcome = r.converged ? `converged after ${r.iterations} iterations` : `did not converge (${r.stopReason}) after ${r.iterations} iterations`;
  const rms = r.rmsA >= 1e-6 ? `${sci(r.rmsA * 1e6, 3)} µA` : `${sci(r.rmsA * 1e9, 3)} nA`;
  return `Model ${r.mechanism}, ${couples}, ${fitted}; window ${lo} … ${hi} V vs ${entry.scale.name}, ${r.pointCount} points; ${outcome} (${r.evaluations} simulations); rms residual ${rms}.`;
}
