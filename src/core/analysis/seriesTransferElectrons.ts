/**
 * k° and E°′ of a series couple when n > 1 and nₐ (electrons in the rate-determining step) was not
 * given: 1 ≤ nₐ ≤ n, and the methods beyond Nicholson's table depend on it.
 * In: k° at the default nₐ (1) and a function giving k° at another nₐ (null where the measured αnₐ
 *   is impossible with it). Out: the k° at the default when every possible nₐ agrees; otherwise
 *   status 'cannot-tell' with k°'s and E°′'s range over every nₐ and αc, and the reason, naming
 *   each nₐ's result and the nₐ (if any) whose k° is the same at every scan rate.
 * Sources: the forward wave of a totally irreversible couple fixes only the product αnₐ (Bard &
 *   Faulkner, Electrochemical Methods 2nd ed. (2001) §6.3; J. Wang, Analytical Electrochemistry 2nd
 *   ed. (2000) eq. 2-5); the return wave runs with (1 − αc)·nₐ, so E°′ and k° from the return peak
 *   change with nₐ at a fixed αnₐ (R. Guidelli et al., Pure Appl. Chem. 86, 245 (2014), from
 *   memory). Nicholson's ψ (Anal. Chem. 37, 1351 (1965)) does not take nₐ and is left as it is.
 * Rule (ours): two nₐ agree when each one's k° lies within the other's range, or neither gives a
 *   value.
 */
import type { SeriesRateConstant } from './seriesTypes';

const sci = (x: number) => (x < 1e-3 ? x.toExponential(1) : x.toPrecision(2));

function agree(a: SeriesRateConstant, b: SeriesRateConstant): boolean {
  if (a.status !== 'value' && b.status !== 'value') return a.status === b.status;
  if (a.status !== 'value' || b.status !== 'value' || a.k0CmPerS === null || b.k0CmPerS === null) return false;
  const within = (x: number, r: [number, number] | null) => r !== null && x >= r[0] && x <= r[1];
  return within(a.k0CmPerS, b.rangeCmPerS) && within(b.k0CmPerS, a.rangeCmPerS);
}

function describe(na: number, k: SeriesRateConstant): string {
  const e0 = k.formalPotentialV != null ? `, E°′ = ${k.formalPotentialV.toFixed(4)} V` : '';
  if (k.status === 'value' && k.k0CmPerS !== null) return `nₐ = ${na}: k° = ${sci(k.k0CmPerS)} cm/s${e0}`;
  if (k.driftFold != null) return `nₐ = ${na}: the per-file k° drifts ${k.driftFold.toFixed(1)}-fold with scan rate${e0}`;
  if (k.status === 'lower-bound') return `nₐ = ${na}: k° ≥ ${k.lowerBoundCmPerS === null ? '?' : sci(k.lowerBoundCmPerS)} cm/s`;
  return `nₐ = ${na}: no k° (${k.reason ?? 'not determinable'})`;
}

function union(ranges: Array<[number, number] | null | undefined>): [number, number] | null {
  const r = ranges.filter((x): x is [number, number] => !!x);
  return r.length ? [Math.min(...r.map((x) => x[0])), Math.max(...r.map((x) => x[1]))] : null;
}

/** Per file: the head's entry with its k° and E°′ ranges widened over every nₐ. */
function widenedPerFile(all: Array<{ na: number; k: SeriesRateConstant }>, head: SeriesRateConstant): SeriesRateConstant['perFile'] {
  return head.perFile.map((f) => {
    const same = all.flatMap(({ k }) => k.perFile.filter((g) => g.fileIndex === f.fileIndex));
    const k0s = same.flatMap((g) => (g.k0CmPerS === null ? [] : [[g.k0CmPerS, g.k0CmPerS] as [number, number], g.rangeCmPerS]));
    const e0s = same.flatMap((g) => (g.formalPotentialV == null ? [] : [[g.formalPotentialV, g.formalPotentialV] as [number, number], g.formalPotentialRangeV]));
    return { ...f, rangeCmPerS: union(k0s), formalPotentialRangeV: union(e0s) };
  });
}

export function rateConstantOverTransferElectrons(head: SeriesRateConstant, at: (na: number) => SeriesRateConstant | null, electronCount: number): SeriesRateConstant {
  const beyondTable = head.perFile.some((f) => f.method === 'irreversible' || f.method === 'forward-peak')
    || head.perFile.some((f) => f.k0CmPerS === null && f.method === null && f.reason !== null && /departure|return peak|settle/.test(f.reason));
  if (!beyondTable) return head;
  const all = [{ na: 1, k: head }];
  for (let na = 2; na <= electronCount; na++) {
    const k = at(na);
    if (k) all.push({ na, k });
  }
  if (all.every(({ k }) => agree(k, head))) return head;
  const steady = all.filter(({ k }) => k.status === 'value');
  const which = steady.length === 1
    ? ` Only nₐ = ${steady[0]!.na} gives one k° at every scan rate; give nₐ (--na) to use it.`
    : ' Give nₐ (--na) when it is known.';
  return {
    ...head, status: 'cannot-tell', k0CmPerS: null, lowerBoundCmPerS: null, driftFold: null,
    rangeCmPerS: union(all.flatMap(({ k }) => [k.rangeCmPerS, k.k0CmPerS === null ? null : [k.k0CmPerS, k.k0CmPerS] as [number, number]])),
    formalPotentialV: null,
    formalPotentialRangeV: union(all.flatMap(({ k }) => [k.formalPotentialRangeV, k.formalPotentialV == null ? null : [k.formalPotentialV, k.formalPotentialV] as [number, number]])),
    formalPotentialSource: head.formalPotentialSource == null ? null : `depends on nₐ, which was not given (1 ≤ nₐ ≤ ${electronCount}): the range holds every nₐ and αc`,
    perFile: widenedPerFile(all, head),
    reason: `nₐ was not given (n = ${electronCount}, so 1 ≤ nₐ ≤ ${electronCount}), and k° and E°′ beyond Nicholson's table depend on it: ${all.map(({ na, k }) => describe(na, k)).join('; ')}.${which}`,
  };
}
