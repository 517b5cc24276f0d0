/** Numbers of each series couple: fits with 95 % intervals, D, log–log reading, k°, Γ, k_s, k_f, Cd, verdict; each derived number explains itself. */
import type { ReactNode } from 'react';
import type { FitLineResult } from '../../core/regression/fitLine';
import { capacitanceText, explainCapacitance, explainCouple } from '../../state/explain';
import type { RunSeriesResult, SeriesCouple } from '../../state/types';
import { DASH, fixed, sci, sig } from '../format';
import { Explained } from './Explained';
import { DReading, K0Reading } from './SeriesReadings';

function fitText(fit: FitLineResult | null | undefined, factor: number, unit: string): string {
  if (!fit) return DASH;
  const ci = fit.slopeInterval ? ` [${sig(fit.slopeInterval[0], 3, factor)}, ${sig(fit.slopeInterval[1], 3, factor)}]` : '';
  return `${sig(fit.slope, 4, factor)}${ci} ${unit}; intercept ${sig(fit.intercept, 3, factor)} µA; R² ${fixed(fit.r2, 4)}`;
}

function rows(s: RunSeriesResult, c: SeriesCouple): [string, ReactNode][] {
  const d = c.diffusion;
  const t = c.transferCoefficient;
  const sf = c.surface;
  const x = explainCouple(s, c);
  return [
    ['E½ (median)', c.eHalfV === null ? DASH : `${fixed(c.eHalfV, 4)} V${c.eHalfMeaning ? ` (${c.eHalfMeaning})` : ''}`],
    ['Regime / kinetics', `${c.regime}, ${c.kineticClass}`],
    c.regime === 'surface'
      ? ['Forward |ip| vs v (slope 95 % CI)', fitText(sf?.fit, 1e6, 'µA (V/s)⁻¹')]
      : ['Forward |ip| vs v½ (slope 95 % CI)', fitText(c.forwardFit, 1e6, 'µA (V/s)⁻½')],
    ['D (Randles–Ševčík)', d ? <><DReading result={s} c={c} explanation={x.D} /> — {d.form} form{d.alphaUsed !== null ? `, αc ${fixed(d.alphaUsed, 2)}` : ''}</> : DASH],
    ['log|ip| vs log v slope', c.logLog ? `${fixed(c.logLog.slope, 3)} → ${c.logLog.reading}` : DASH],
    ['dEpa / dlog v', c.peakShift.anodic ? `${fixed(c.peakShift.anodic.slopeVPerDecade, 1, 1000)} mV/decade` : DASH],
    ['dEpc / dlog v', c.peakShift.cathodic ? `${fixed(c.peakShift.cathodic.slopeVPerDecade, 1, 1000)} mV/decade` : DASH],
    ['αc and the forward αnₐ', t ? <Explained explanation={x.alpha}>{t.text}</Explained> : c.alpha === null ? DASH : <Explained explanation={x.alpha}>αc {fixed(c.alpha, 2)}</Explained>],
    ['k° (median over files)', <K0Reading result={s} c={c} explanation={x.k0} />],
    ['Ohmic drop', c.ohmic ? c.ohmic.text : DASH],
    ['Γ from charge / from slope', sf ? <Explained explanation={x.gamma}>{sci(sf.coverageFromChargeMolPerCm2, 3)} / {sci(sf.coverageFromSlopeMolPerCm2, 3)} mol/cm²</Explained> : DASH],
    ['k_s (Laviron)', <KsReading surface={sf} explanation={x.ks} />],
    ['k_f (follow-up reaction)', c.followUp?.rateConstantPerS != null ? <Explained explanation={x.kf}>{sci(c.followUp.rateConstantPerS, 3)} s⁻¹</Explained>
      : c.followUp?.lowerBoundPerS != null ? <Explained explanation={x.kf}>≥ {sci(c.followUp.lowerBoundPerS, 2)} s⁻¹</Explained> : DASH],
    ['Reading', c.verdict.label],
  ];
}

/**
 * k_s with its status, as the run gives it: a value; an estimate with its range (αc assumed, or
 * one file); a lower bound; or "cannot tell" with the reason (an uncompensated resistance, say).
 */
function KsReading({ surface: sf, explanation }: { surface: SeriesCouple['surface']; explanation: Parameters<typeof Explained>[0]['explanation'] }) {
  if (!sf) return <>{DASH}</>;
  // The note's head ("uncompensated resistance? (Ru ≈ 100 Ω would explain it)"); the whole reason is among the notes below.
  if (sf.ksStatus === 'cannot-tell') return <span className="warn-text" data-testid="ks-reading">cannot tell — {sf.ksNote.replace(/^cannot tell — /, '').split(':')[0]}; see the notes below</span>;
  if (sf.ksStatus === 'lower-bound') return sf.ksLowerBoundPerS === null ? <>{DASH}</> : <Explained explanation={explanation}>≥ {sci(sf.ksLowerBoundPerS, 2)} s⁻¹ (lower bound)</Explained>;
  if (sf.ksPerS === null) return <>{DASH}</>;
  const range = sf.ksStatus === 'estimate' && sf.ksRangePerS ? `; estimate, range ${sci(sf.ksRangePerS[0], 2)}–${sci(sf.ksRangePerS[1], 2)} s⁻¹` : '';
  return <Explained explanation={explanation}>{sci(sf.ksPerS, 3)} s⁻¹{range}</Explained>;
}

export function SeriesTable({ result }: { result: RunSeriesResult }) {
  const cd = explainCapacitance(result);
  return (
    <div className="series-tables" data-testid="series-table" data-d-first={result.analysis.couples[0]?.diffusion?.diffusionCm2PerS ?? undefined}>
      {result.analysis.couples.map((c) => (
        <table key={c.index} className="data kv">
          <caption>Couple {c.index + 1} · {filesAndRates(c.points)}</caption>
          <tbody>
            {rows(result, c).map(([k, v]) => (
              <tr key={k}><th scope="row">{k}</th><td className="wrap">{v}</td></tr>
            ))}
          </tbody>
          {c.diagnostics.length > 0 ? (
            <tfoot><tr><td colSpan={2} className="wrap"><ul className="diagnostics">{c.diagnostics.map((t) => <li key={t}>{t}</li>)}</ul></td></tr></tfoot>
          ) : null}
        </table>
      ))}
      {result.capacitance ? (
        <p data-testid="series-cd">Double-layer capacitance Cd <Explained explanation={cd ?? undefined}>{capacitanceText(result.capacitance)}</Explained></p>
      ) : null}
      {result.analysis.warnings.length > 0 ? <ul className="notes">{result.analysis.warnings.map((w) => <li key={w.message}>{w.message}</li>)}</ul> : null}
    </div>
  );
}

/** "6 scan rates", or "12 files at 1 scan rate" where files share a rate. */
function filesAndRates(points: ReadonlyArray<{ scanRateVPerS: number }>): string {
  const rates = new Set(points.map((p) => p.scanRateVPerS)).size;
  const r = `${rates} scan rate${rates === 1 ? '' : 's'}`;
  return rates === points.length ? r : `${points.length} files at ${r}`;
}
