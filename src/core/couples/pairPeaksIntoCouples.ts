/**
 * Pairs anodic and cathodic peaks into redox couples. Both lists are sorted by potential and
 * matched without crossings (the k-th couple's peaks lie between those of the couples on either
 * side), by dynamic programming that minimises Σ|ΔEp| over pairs plus a penalty of
 * weight·`maxDeltaEpV` for each unpaired peak. A pair is allowed only when −`maxNegativeDeltaEpV` ≤ Epa − Epc ≤
 * `maxDeltaEpV`. When each direction has a single dominant peak (weight ≥ `dominantWeight`, every
 * other peak smaller; a direction's only peak needs a third of that), those two may pair up to `wideMaxDeltaEpV` apart: a totally irreversible
 * couple routinely shows ΔEp of 0.5–1 V (e.g. k° = 1e-5 cm/s, α = 0.5 gives ≈ 0.7 V at 0.1 V/s,
 * Wang, Analytical Electrochemistry 2nd ed. (2000) eq. 2-5), while with several comparable peaks per
 * direction the narrow limit keeps separate couples apart. Those two dominant peaks, if the cost
 * balance leaves both single, are joined when no other pair lies between them.
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
  // Backtracked in sorted positions; [x, -1] and [-1, y] are single peaks.
  const matched: Array<[number, number]> = [];
  let x = a.length;
  let y = c.length;
  while (x > 0 || y > 0) {
    const here = best[x]![y]!;
    if (x > 0 && y > 0 && here === best[x - 1]![y - 1]! + cost(x - 1, y - 1)) matched.push([--x, --y]);
    else if (x > 0 && here === best[x - 1]![y]! + a[x - 1]!.w) matched.push([--x, -1]);
    else matched.push([-1, --y]);
  }
  if (da >= 0 && dc >= 0 && Number.isFinite(cost(da, dc))) joinDominant(matched, da, dc);
  const pairs: PeakPair[] = matched.map(([px, py]) => ({ anodic: px < 0 ? null : a[px]!.i, cathodic: py < 0 ? null : c[py]!.i }));
  const mid = (p: PeakPair) => {
    const va = p.anodic === null ? null : anodicV[p.anodic]!;
    const vc = p.cathodic === null ? null : cathodicV[p.cathodic]!;
    return va !== null && vc !== null ? (va + vc) / 2 : (va ?? vc ?? 0);
  };
  return pairs.sort((p, q) => mid(p) - mid(q));
}

/**
 * The two dominant peaks, both left single, become one couple when they are within the wide limit
 * and cross no other pair. The cost balance can leave them apart: a totally irreversible couple's
 * return peak is small (ip ratio 0.3-0.4 at fast scans), so its weight·maxDeltaEpV plus the forward
 * peak's undercut a ΔEp of 0.8 V, though nothing else competes for either peak.
 */
function joinDominant(matched: Array<[number, number]>, da: number, dc: number): void {
  const ka = matched.findIndex(([x, y]) => x === da && y < 0);
  const kc = matched.findIndex(([x, y]) => y === dc && x < 0);
  if (ka < 0 || kc < 0) return;
  if (matched.some(([x, y]) => x >= 0 && y >= 0 && x < da !== y < dc)) return;
  matched.splice(Math.max(ka, kc), 1);
  matched.splice(Math.min(ka, kc), 1, [da, dc]);
}

/**
 * Position of the only peak whose weight reaches `threshold`, or −1 when there are none or several.
 * A direction's only peak needs a third of it: a totally irreversible couple's return peak falls
 * to 0.2-0.4 of the forward one at fast scans, and with nothing else in its direction it is the
 * forward peak's only possible partner.
 */
function loneDominant(peaks: ReadonlyArray<{ w: number }>, threshold: number): number {
  if (peaks.length === 1) return peaks[0]!.w >= threshold / 3 ? 0 : -1;
  const strong = peaks.flatMap((p, k) => (p.w >= threshold ? [k] : []));
  return strong.length === 1 ? strong[0]! : -1;
}
