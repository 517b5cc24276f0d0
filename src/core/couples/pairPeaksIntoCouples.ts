/**
 * Pairs anodic and cathodic peaks into redox couples. Both lists are sorted by potential and
 * matched without crossings (the k-th couple's peaks lie between those of the couples on either
 * side), by dynamic programming that minimises Σ|ΔEp| over pairs plus a penalty of
 * weight·`maxDeltaEpV` for each unpaired peak. A pair is allowed only when −`maxNegativeDeltaEpV` ≤ Epa − Epc ≤
 * `maxDeltaEpV`. When each direction has a single dominant peak (weight ≥ `dominantWeight`; every
 * other peak smaller), those two may pair up to `wideMaxDeltaEpV` apart: a totally irreversible
 * couple routinely shows ΔEp of 0.5–1 V (e.g. k° = 1e-5 cm/s, α = 0.5 gives ≈ 0.7 V at 0.1 V/s,
 * Wang, Analytical Electrochemistry 2nd ed. (2000) eq. 2-5), while with several comparable peaks per
 * direction the narrow limit keeps separate couples apart.
 * Method: order-preserving assignment (common practice, no source); limits are ours.
 * In: peak potentials (V) of each kind. Out: pairs of indices into the input lists, unpaired
 *   peaks as pairs with null on the missing side, sorted by mid-potential.
 */
import { AnalysisError } from '../errors';

export interface PairPeaksOptions {
  /** Largest allowed Epa − Epc (V). @default 0.6 */
  maxDeltaEpV?: number;
  /**
   * Largest Epa − Epc (V) for the pair of dominant peaks when each direction has exactly one.
   * @default 2·maxDeltaEpV
   */
  wideMaxDeltaEpV?: number;
  /** Weight from which a peak counts as dominant (see wideMaxDeltaEpV). @default 0.3 */
  dominantWeight?: number;
  /** Largest allowed Epc − Epa (V); adsorbed couples sit near ΔEp = 0. @default 0.03 */
  maxNegativeDeltaEpV?: number;
  /**
   * Weight (0…1) of each peak, e.g. its height over the largest height: leaving a small peak
   * unpaired costs only weight·maxDeltaEpV, so two small features cannot pull a large couple
   * apart. @default 1 for every peak
   */
  anodicWeights?: readonly number[];
  cathodicWeights?: readonly number[];
}

export interface PeakPair {
  anodic: number | null;
  cathodic: number | null;
}

export function pairPeaksIntoCouples(anodicV: readonly number[], cathodicV: readonly number[], options: PairPeaksOptions = {}): PeakPair[] {
  const maxDelta = options.maxDeltaEpV ?? 0.6;
  const maxNegative = options.maxNegativeDeltaEpV ?? 0.03;
  if (!(maxDelta > 0) || !(maxNegative >= 0)) throw new AnalysisError('BAD_OPTION', `maxDeltaEpV must be > 0 and maxNegativeDeltaEpV ≥ 0, got ${maxDelta}, ${maxNegative}`);
  const wide = options.wideMaxDeltaEpV ?? 2 * maxDelta;
  if (!(wide >= maxDelta)) throw new AnalysisError('BAD_OPTION', `wideMaxDeltaEpV must be ≥ maxDeltaEpV (${maxDelta}), got ${wide}`);
  const a = anodicV.map((v, i) => ({ v, i, w: maxDelta * (options.anodicWeights?.[i] ?? 1) })).sort((p, q) => p.v - q.v);
  const c = cathodicV.map((v, i) => ({ v, i, w: maxDelta * (options.cathodicWeights?.[i] ?? 1) })).sort((p, q) => p.v - q.v);
  const da = loneDominant(a, maxDelta * (options.dominantWeight ?? 0.3));
  const dc = loneDominant(c, maxDelta * (options.dominantWeight ?? 0.3));
  const cost = (x: number, y: number) => {
    const d = a[x]!.v - c[y]!.v;
    const limit = x === da && y === dc ? wide : maxDelta;
    return d <= limit && d >= -maxNegative ? Math.abs(d) : Infinity;
  };
  // best[x][y]: least cost of matching the first x anodic with the first y cathodic peaks.
  const best = Array.from({ length: a.length + 1 }, () => new Array<number>(c.length + 1).fill(0));
  for (let x = 0; x <= a.length; x++) {
    for (let y = 0; y <= c.length; y++) {
      if (x === 0 && y === 0) continue;
      best[x]![y] = Math.min(
        x > 0 ? best[x - 1]![y]! + a[x - 1]!.w : Infinity,
        y > 0 ? best[x]![y - 1]! + c[y - 1]!.w : Infinity,
        x > 0 && y > 0 ? best[x - 1]![y - 1]! + cost(x - 1, y - 1) : Infinity,
      );
    }
  }
  const pairs: PeakPair[] = [];
  let x = a.length;
  let y = c.length;
  while (x > 0 || y > 0) {
    const here = best[x]![y]!;
    if (x > 0 && y > 0 && here === best[x - 1]![y - 1]! + cost(x - 1, y - 1)) {
      pairs.push({ anodic: a[--x]!.i, cathodic: c[--y]!.i });
    } else if (x > 0 && here === best[x - 1]![y]! + a[x - 1]!.w) {
      pairs.push({ anodic: a[--x]!.i, cathodic: null });
    } else {
      pairs.push({ anodic: null, cathodic: c[--y]!.i });
    }
  }
  const mid = (p: PeakPair) => {
    const va = p.anodic === null ? null : anodicV[p.anodic]!;
    const vc = p.cathodic === null ? null : cathodicV[p.cathodic]!;
    return va !== null && vc !== null ? (va + vc) / 2 : (va ?? vc ?? 0);
  };
  return pairs.sort((p, q) => mid(p) - mid(q));
}

/** Position of the only peak whose weight reaches `threshold`, or −1 when there are none or several. */
function loneDominant(peaks: ReadonlyArray<{ w: number }>, threshold: number): number {
  const strong = peaks.flatMap((p, k) => (p.w >= threshold ? [k] : []));
  return strong.length === 1 ? strong[0]! : -1;
}
