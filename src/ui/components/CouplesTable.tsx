/** Redox couples of the shown cycle(s): potentials on the display scale, currents, verdict with reasons. */
import { chooseCurrentScale } from '../plots/currentScale';
import { DASH, fixed, sig } from '../format';
import { useSelection } from './useSelection';

export function CouplesTable() {
  const { result, cycle, scale, file } = useSelection();
  const cycles = (result?.run?.analysis.cycles ?? []).filter((c) => cycle === 0 || c.index === cycle);
  const rows = cycles.flatMap((c) => c.couples.map((k) => ({ cycle: c.index, k })));
  if (!file?.measurement) return <p className="empty">No file selected.</p>;
  if (!result?.run) return <p className="empty">{result?.status === 'error' ? 'Analysis failed (see the trace).' : 'Analysing…'}</p>;
  if (rows.length === 0) return <p className="empty" data-testid="couples-empty">No peaks found in this cycle. Mark a peak window on the plot or lower the signal-to-noise threshold.</p>;
  // A file of current densities (no area stated) gives peak currents per cm².
  const perArea = file.measurement.currentKind === 'density' ? ' cm⁻²' : '';
  const cur = chooseCurrentScale(Math.max(...rows.map(({ k }) => Math.max(k.ipaA ?? 0, k.ipcA ?? 0))));
  return (
    <table className="data" data-testid="couples-table">
      <caption className="visually-hidden">Couples, potentials vs {scale.name}</caption>
      <thead>
        <tr>
          <th scope="col">Cycle</th><th scope="col">Epa / V</th><th scope="col">Epc / V</th><th scope="col">E½ / V</th>
          <th scope="col">ΔEp / mV</th><th scope="col">ipa / {cur.unit}{perArea}</th><th scope="col">ipc / {cur.unit}{perArea}</th>
          <th scope="col" title="return / forward peak current">ratio</th><th scope="col" title="|Ep − Ep/2| of the anodic / cathodic peak">|Ep−Ep/2| / mV</th>
          <th scope="col">Q / µC</th><th scope="col">Reading</th>
        </tr>
      </thead>
      <tbody>
        {rows.map(({ cycle: c, k }) => (
          <tr key={`${c}-${k.index}`} data-testid="couple-row">
            <td>{c}</td>
            <td data-testid="cell-epa">{fixed(k.epaV, 4)}</td>
            <td data-testid="cell-epc">{fixed(k.epcV, 4)}</td>
            <td data-testid="cell-ehalf">{fixed(k.eHalfV, 4)}</td>
            <td data-testid="cell-dep">{fixed(k.deltaEpV, 1, 1000)}</td>
            <td data-testid="cell-ipa">{sig(k.ipaA, 4, cur.factor)}</td>
            <td data-testid="cell-ipc">{sig(k.ipcA, 4, cur.factor)}</td>
            <td>{fixed(k.ratio, 3)}</td>
            <td>{fixed(k.anodicHalfPeakWidthV, 1, 1000)} / {fixed(k.cathodicHalfPeakWidthV, 1, 1000)}</td>
            <td>{k.anodicChargeC === null && k.cathodicChargeC === null ? DASH : `${sig(k.anodicChargeC, 3, 1e6)} / ${sig(k.cathodicChargeC, 3, 1e6)}`}</td>
            <td className="verdict">
              <details>
                <summary data-testid="verdict">{k.verdict.label}</summary>
                <ul>{k.verdict.reasons.map((r) => <li key={r}>{r}</li>)}</ul>
              </details>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
