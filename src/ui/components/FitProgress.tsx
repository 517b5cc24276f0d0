/** While a fit runs: which model, which stage, the iteration and the sum of squared residuals so far. */
import { useHalfwave } from '../../state/react';
import { sci } from '../format';

export function FitProgress({ group }: { group: string }) {
  const entry = useHalfwave((s) => s.fits[group]);
  if (entry?.status !== 'running') return null;
  const p = entry.progress;
  const parts = [entry.progressText || 'starting'];
  if (p?.modelCount && p.modelCount > 1) parts.push(`model ${p.modelIndex + 1} of ${p.modelCount}`);
  if (p?.costA2 != null) parts.push(`Σ residual² ${sci(p.costA2, 3)} A²`);
  if (p?.evaluations) parts.push(`${p.evaluations} simulations`);
  return (
    <div className="fit-progress" data-testid="fit-progress">
      <progress aria-label="Fit in progress" />
      <span data-testid="fit-progress-text" data-iteration={p?.iteration ?? 0}>{parts.join(' · ')}</span>
    </div>
  );
}
