/** The model-choice advice: each model's BIC and AIC relative to the best, and the recommendation (the fit shown stays the one chosen). */
import type { FitEntry } from '../../state/types';

export function FitComparison({ entry }: { entry: FitEntry }) {
  const c = entry.comparison;
  return (
    <section aria-labelledby="fit-choice-title" data-testid="fit-comparison">
      <h3 id="fit-choice-title">Which model the data favour</h3>
      {c ? (
        <>
          <table className="data compact">
            <thead><tr><th scope="col">Model</th><th scope="col">Parameters</th><th scope="col">ΔBIC</th><th scope="col">ΔAIC</th><th scope="col">Converged</th></tr></thead>
            <tbody>
              {c.candidates.map((k) => (
                <tr key={k.label}>
                  <th scope="row">{k.label}{k.label === c.preferred ? ' (favoured)' : ''}</th>
                  <td>{k.parameterCount}</td><td>{k.deltaBic.toFixed(1)}</td><td>{k.deltaAic.toFixed(1)}</td><td>{k.converged ? 'yes' : 'no'}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p data-testid="fit-recommendation">{capitalise(c.recommendation)}.</p>
          <p className="hint">Δ from the lowest; lower is better. BIC charges each extra parameter ln(number of points), AIC charges 2.</p>
        </>
      ) : (
        <p className="hint">Not compared. Choose “Compare with” before fitting to weigh E against EC, or R_u fitted against held.</p>
      )}
    </section>
  );
}

const capitalise = (t: string) => t.charAt(0).toUpperCase() + t.slice(1);
