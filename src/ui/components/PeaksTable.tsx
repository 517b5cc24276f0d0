/** Every peak found, with how it was found, its baseline and how sure the finder is. */
import { chooseCurrentScale } from '../plots/currentScale';
import { fixed, sig } from '../format';
import { PeakBaselineSelect } from './PeakBaselineSelect';
import { useSelection } from './useSelection';
import { useWorkingWindow } from './useWorkingWindow';

/** Within this distance of a working-window limit (V), a peak is flagged as possibly breakdown (common practice, no source). */
const EDGE_V = 0.05;

export function PeaksTable() {
  const { result, cycle, scale, file } = useSelection();
  const working = useWorkingWindow(file?.group ?? null);
  const atEdge = (e: number) => (working?.lowerV != null && e <= working.lowerV + EDGE_V) || (working?.upperV != null && e >= working.upperV - EDGE_V);
  const cycles = (result?.run?.analysis.cycles ?? []).filter((c) => cycle === 0 || c.index === cycle);
  const rows = cycles.flatMap((c) => c.peaks.map((p, k) => ({ cycle: c.index, p, k })));
  if (rows.length === 0) return <p className="empty">No peaks.</p>;
  const cur = chooseCurrentScale(Math.max(...rows.map(({ p }) => p.heightA)));
  return (
    <table className="data peaks" data-testid="peaks-table">
      <thead>
        <tr>
          <th scope="col">Cycle</th><th scope="col">Kind</th><th scope="col">Ep / V vs {scale.name}</th><th scope="col">ip / {cur.unit}{file?.measurement?.currentKind === 'density' ? ' cm⁻²' : ''}</th>
          <th scope="col">Ep/2 / V</th><th scope="col">FWHM / mV</th><th scope="col">S/N</th><th scope="col">Confidence</th><th scope="col">Baseline choice</th><th scope="col">Baseline used</th>
        </tr>
      </thead>
      <tbody>
        {rows.map(({ cycle: c, p, k }) => (
          <tr key={`${c}-${k}`}>
            <td>{c}</td>
            <td className={p.direction}>
              {p.direction}{p.origin === 'window' ? ' (window)' : ''}
              {atEdge(p.potentialV) ? <span className="warn-text" data-testid="peak-at-edge" title="This peak lies at or beyond a limit of the working window: a steep rise there is usually the solvent or electrolyte breaking down, or a catalytic current, rather than a redox peak."> at the window edge</span> : null}
            </td>
            <td>{fixed(p.potentialV, 4)}</td>
            <td>{sig(p.heightA, 4, cur.factor)}</td>
            <td>{fixed(p.halfPeakPotentialV, 4)}</td>
            <td>{fixed(p.fwhmV, 1, 1000)}</td>
            <td>{fixed(p.signalToNoise, 0)}</td>
            <td>{p.confidence}</td>
            <td><PeakBaselineSelect peak={p} offsetV={result?.run?.reference.offsetV ?? 0} label={`Baseline of the ${p.direction} peak at ${fixed(p.potentialV, 3)} V, cycle ${c}`} /></td>
            <td className="wrap">{p.baseline.description}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
