/**
 * How the series table and the headline say D and k°: a value with its 95 % interval, a range
 * only, a lower bound, or "cannot tell" with the reason; and which defaults a number rests on.
 * Both places read them from here, so they cannot word the same result two ways.
 */
import type { ReactNode } from 'react';
import type { Explanation } from '../../state/explain';
import type { RunSeriesResult, SeriesCouple } from '../../state/types';
import { DASH, sci, valueWithInterval } from '../format';
import { Explained } from './Explained';

const span = (r: [number, number] | null | undefined, digits = 3) => (r ? `${sci(r[0], digits)} to ${sci(r[1], digits)}` : '');

/** The defaults (never given, never in a header) that `quantity` rests on, in words; empty when none. */
export function restsOn(result: RunSeriesResult, quantity: 'D' | 'k°' | 'Γ'): string {
  const used = result.defaultsUsed.filter((d) => d.affects.includes(quantity));
  return used.length ? `rests on the default ${used.map((d) => d.value).join(' and ')}` : '';
}

function DefaultMark({ text }: { text: string }) {
  return text ? <span className="warn-text default-mark" data-testid="rests-on-default"> ({text})</span> : null;
}

export function DReading({ result, c, explanation }: { result: RunSeriesResult; c: SeriesCouple; explanation?: Explanation | undefined }): ReactNode {
  const d = c.diffusion;
  if (!d) return DASH;
  const mark = <DefaultMark text={restsOn(result, 'D')} />;
  if (d.status === 'range-only') {
    return <span data-testid="d-range-only">between <Explained explanation={explanation}>{span(d.rangeCm2PerS)} cm²/s</Explained> (range only: {d.note ?? 'D cannot be told apart from another unknown'}){mark}</span>;
  }
  // D and its interval with the digits the interval supports (at least three).
  const shown = valueWithInterval(d.diffusionCm2PerS, d.intervalCm2PerS);
  const ci = shown.interval ? ` (95 % interval ${shown.interval})` : '';
  const withCell = d.combinedIntervalCm2PerS ? valueWithInterval(d.diffusionCm2PerS, d.combinedIntervalCm2PerS).interval : null;
  const combined = withCell ? ` (with the uncertainty of area and concentration: ${withCell})` : '';
  const alphaRange = d.alphaEndsCm2PerS ? `; over αc ${span(d.alphaEndsCm2PerS)}` : '';
  return <><Explained explanation={explanation}>{shown.value} cm²/s</Explained>{ci}{combined}{alphaRange}{mark}</>;
}

export function K0Reading({ result, c, explanation }: { result: RunSeriesResult; c: SeriesCouple; explanation?: Explanation | undefined }): ReactNode {
  const k = c.rateConstant;
  if (!k) return DASH;
  const mark = <DefaultMark text={restsOn(result, 'k°')} />;
  if (k.status === 'value' && k.k0CmPerS !== null) {
    return <span data-testid="k0-value"><Explained explanation={explanation}>{sci(k.k0CmPerS, 3)} cm/s</Explained>{k.rangeCmPerS ? ` (over αc: ${span(k.rangeCmPerS, 2)})` : ''}{mark}</span>;
  }
  if (k.status === 'lower-bound' && k.lowerBoundCmPerS !== null) {
    return <span data-testid="k0-bound">≥ <Explained explanation={explanation}>{sci(k.lowerBoundCmPerS, 2)} cm/s</Explained>{k.reason ? ` (lower bound: ${k.reason})` : ' (lower bound)'}{mark}</span>;
  }
  return <span data-testid="k0-cannot-tell" className="warn-text">cannot tell{k.reason ? `: ${k.reason}` : ''}</span>;
}
