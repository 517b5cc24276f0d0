/** Numbers of each series couple: fits with 95 % intervals, D, log–log reading, k°, Γ, k_s, verdict. */
import type { FitLineResult } from '../../core/regression/fitLine';
import type { SeriesAnalysis, SeriesCouple } from '../../state/types';
import { DASH, fixed, sci, sig } from '../format';

function fitText(fit: FitLineResult | null | undefined, factor: number, unit: string): string {
  if (!fit) return DASH;
  const ci = fit.slopeInterval ? ` [${sig(fit.slopeInterval[0], 3, factor)}, ${sig(fit.slopeInterval[1], 3, factor)}]` : '';
  return `${sig(fit.slope, 4, factor)}${ci} ${unit}; intercept ${sig(fit.intercept, 3, factor)} µA; R² ${fixed(fit.r2, 4)}`;
}

function rows(c: SeriesCouple): [string, string][] {
  const d = c.diffusion;
  const k = c.rateConstant;
  const s = c.surface;
  return [
    ['E½ (median)', c.eHalfV === null ? DASH : `${fixed(c.eHalfV, 4)} V`],
    ['Regime / kinetics', `${c.regime}, ${c.kineticClass}`],
    c.regime === 'surface'
      ? ['Forward |ip| vs v (slope 95 % CI)', fitText(s?.fit, 1e6, 'µA (V/s)⁻¹')]
      : ['Forward |ip| vs v½ (slope 95 % CI)', fitText(c.forwardFit, 1e6, 'µA (V/s)⁻½')],
    ['D (Randles–Ševčík)', d ? `${sci(d.diffusionCm2PerS, 3)} cm²/s${d.intervalCm2PerS ? ` [${sci(d.intervalCm2PerS[0], 3)}, ${sci(d.intervalCm2PerS[1], 3)}]` : ''} (${d.form} form${d.alphaUsed !== null ? `, α ${fixed(d.alphaUsed, 2)}` : ''})` : DASH],
    ['log|ip| vs log v slope', c.logLog ? `${fixed(c.logLog.slope, 3)} → ${c.logLog.reading}` : DASH],
    ['dEpa / dlog v', c.peakShift.anodic ? `${fixed(c.peakShift.anodic.slopeVPerDecade, 1, 1000)} mV/decade` : DASH],
    ['dEpc / dlog v', c.peakShift.cathodic ? `${fixed(c.peakShift.cathodic.slopeVPerDecade, 1, 1000)} mV/decade` : DASH],
    ['α (Ep–log v)', fixed(c.alpha, 2)],
    ['k° (Nicholson, median)', k?.k0CmPerS != null ? `${sci(k.k0CmPerS, 3)} cm/s` : k?.lowerBoundCmPerS != null ? `≥ ${sci(k.lowerBoundCmPerS, 2)} cm/s` : DASH],
    ['Γ from charge / from slope', s ? `${sci(s.coverageFromChargeMolPerCm2, 3)} / ${sci(s.coverageFromSlopeMolPerCm2, 3)} mol/cm²` : DASH],
    ['k_s (Laviron)', s?.ksPerS != null ? `${sci(s.ksPerS, 3)} s⁻¹` : DASH],
    ['Reading', c.verdict.label],
  ];
}

export function SeriesTable({ result }: { result: SeriesAnalysis }) {
  return (
    <div className="series-tables" data-testid="series-table" data-d-first={result.couples[0]?.diffusion?.diffusionCm2PerS ?? undefined}>
      {result.couples.map((c) => (
        <table key={c.index} className="data kv">
          <caption>Couple {c.index + 1} · {c.points.length} scan rates</caption>
          <tbody>
            {rows(c).map(([k, v]) => (
              <tr key={k}><th scope="row">{k}</th><td className="wrap">{v}</td></tr>
            ))}
          </tbody>
          {c.diagnostics.length > 0 ? (
            <tfoot><tr><td colSpan={2} className="wrap"><ul className="diagnostics">{c.diagnostics.map((t) => <li key={t}>{t}</li>)}</ul></td></tr></tfoot>
          ) : null}
        </table>
      ))}
      {result.warnings.length > 0 ? <ul className="notes">{result.warnings.map((w) => <li key={w.message}>{w.message}</li>)}</ul> : null}
    </div>
  );
}
