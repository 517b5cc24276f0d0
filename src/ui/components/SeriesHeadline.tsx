/** One line with the series' key numbers (D with its 95 % interval, k°, Γ, k_s), each explaining itself. */
import { explainCouple } from '../../state/explain';
import { useHalfwave } from '../../state/react';
import { DASH, fixed, sci } from '../format';
import { Explained } from './Explained';
import { DReading, K0Reading } from './SeriesReadings';

export function SeriesHeadline({ group }: { group: string }) {
  const entry = useHalfwave((s) => s.series[group]);
  const result = entry?.result;
  if (!result) return <p className="hint series-headline" data-testid="series-headline">Series “{group}”: {entry?.status === 'error' ? entry.error?.message : 'fitting once every file is analysed…'}</p>;
  const couples = result.analysis.couples;
  if (couples.length === 0) return <p className="hint series-headline" data-testid="series-headline">Series “{group}”: no couple could be followed across the scan rates.</p>;
  return (
    <div className="series-headline" data-testid="series-headline">
      {couples.map((c) => {
        const x = explainCouple(result, c);
        const d = c.diffusion;
        const k = c.rateConstant;
        const sf = c.surface;
        return (
          <p key={c.index}>
            <span className="headline-couple">Couple {c.index + 1}{c.eHalfV !== null ? ` (E½ ${fixed(c.eHalfV, 3)} V)` : ''}:</span>{' '}
            {d ? <span data-testid="headline-d">D: <DReading result={result} c={c} explanation={x.D} /></span> : null}
            {k ? <> · k°: <K0Reading result={result} c={c} explanation={x.k0} /></> : null}
            {sf?.coverageFromChargeMolPerCm2 != null ? <> · Γ = <Explained explanation={x.gamma}>{sci(sf.coverageFromChargeMolPerCm2)} mol/cm²</Explained></> : null}
            {sf?.ksPerS != null ? <> · k_s = <Explained explanation={x.ks}>{sci(sf.ksPerS)} s⁻¹</Explained></> : null}
            {!d && !sf ? ` ${DASH}` : null} · {c.verdict.label}
          </p>
        );
      })}
    </div>
  );
}
