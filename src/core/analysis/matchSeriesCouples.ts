/**
 * Groups the couples of several voltammograms of one scan-rate series into series couples.
 * In: per file, its scan rate and the couples of the chosen cycle (each with a position: E½, or
 *   Ep of a lone peak, in V). Out: groups of (fileIndex, couple) with at most one couple per file.
 * Method (design, common practice, no source): files are visited from the slowest scan rate up;
 *   each couple joins the group whose latest position is nearest, within `toleranceV`, so that a
 *   couple whose peaks drift with scan rate (slow kinetics) is still followed; otherwise it opens
 *   a new group. A lone peak (its partner lost, e.g. beyond the switch at a fast rate) is compared
 *   with the group's latest peak of the same direction, not with its E½: a slow film's cathodic
 *   peak lies far from E½ but follows its own trend. Groups are returned in order of their median
 *   position.
 */
import { median } from '../statistics/median';
import type { CoupleResult } from '../couples/coupleTypes';

export interface CoupleRef {
  fileIndex: number;
  couple: CoupleResult;
  positionV: number;
}

/** E½ when both peaks exist, else the lone peak's potential; null when neither. */
export function couplePositionV(c: CoupleResult): number | null {
  return c.eHalfV ?? c.epaV ?? c.epcV ?? null;
}

export function matchSeriesCouples(
  files: Array<{ scanRateVPerS: number; couples: CoupleResult[] }>,
  toleranceV: number,
): CoupleRef[][] {
  const order = files.map((f, i) => ({ i, v: f.scanRateVPerS })).sort((a, b) => a.v - b.v || a.i - b.i);
  const groups: CoupleRef[][] = [];
  for (const { i } of order) {
    const refs = (files[i]?.couples ?? []).flatMap((couple) => {
      const positionV = couplePositionV(couple);
      return positionV === null ? [] : [{ fileIndex: i, couple, positionV }];
    });
    const taken = new Set<number>();
    // Closest pairs first, so two nearby couples do not steal each other's group.
    const pairs = refs.flatMap((r, k) => groups.map((g, gi) => ({ k, gi, d: distanceV(g, r) })));
    pairs.sort((a, b) => a.d - b.d);
    const placed = new Set<number>();
    for (const p of pairs) {
      if (p.d > toleranceV || placed.has(p.k) || taken.has(p.gi)) continue;
      (groups[p.gi] as CoupleRef[]).push(refs[p.k] as CoupleRef);
      placed.add(p.k);
      taken.add(p.gi);
    }
    refs.forEach((r, k) => {
      if (!placed.has(k)) groups.push([r]);
    });
  }
  return groups
    .map((g) => ({ g, m: median(g.map((r) => r.positionV)) }))
    .sort((a, b) => a.m - b.m)
    .map(({ g }) => g.sort((a, b) => (files[a.fileIndex]?.scanRateVPerS ?? 0) - (files[b.fileIndex]?.scanRateVPerS ?? 0)));
}


/** How far a couple lies from a group: from its latest E½, or for a lone peak from its latest peak of that direction. */
function distanceV(group: CoupleRef[], r: CoupleRef): number {
  const last = group[group.length - 1] as CoupleRef;
  if (r.couple.eHalfV !== null) return Math.abs(last.positionV - r.positionV);
  const lone = (c: CoupleResult) => (r.couple.epaV !== null ? c.epaV : c.epcV);
  for (let k = group.length - 1; k >= 0; k--) {
    const e = lone((group[k] as CoupleRef).couple);
    if (e !== null) return Math.abs(e - r.positionV);
  }
  return Math.abs(last.positionV - r.positionV);
}
