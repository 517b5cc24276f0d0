/**
 * Which of a series' reported numbers rest on a value nobody gave (a default of the tool), so the
 * results can say so next to the number: D on the default area or concentration, Γ on the default
 * area, k° with Ru left unset while ΔEp grows with the scan rate (uncompensated resistance widens
 * ΔEp exactly as slow electron transfer does, Bard & Faulkner, Electrochemical Methods 2nd ed.
 * (2001) §6.5, from memory). The electron count's origin is shown with the cell, not warned about:
 * n = 1 is the common case and its effect (|Ep − Ep/2|) is checked by the series itself.
 * The ΔEp growth that counts as "grows" is 10/n mV over the series (common practice, no source).
 */
import { formatMillivolts } from '../units';
import type { ResolvedCell, DefaultUsed, RunWarning } from './runTypes';
import type { SeriesAnalysis } from './seriesTypes';

const isDefault = (cell: ResolvedCell, field: keyof ResolvedCell['origins']) => cell.origins[field] === 'default';

/** The largest rise of ΔEp from the slowest to the fastest scan rate over the series' couples (V), or null. */
function deltaEpRise(series: SeriesAnalysis): { riseV: number; fromV: number; toV: number } | null {
  let best: { riseV: number; fromV: number; toV: number } | null = null;
  for (const c of series.couples) {
    const pts = c.points.filter((p) => p.deltaEpV !== null).sort((a, b) => a.scanRateVPerS - b.scanRateVPerS);
    const first = pts[0];
    const last = pts[pts.length - 1];
    if (!first || !last || first === last) continue;
    const riseV = (last.deltaEpV as number) - (first.deltaEpV as number);
    if (!best || riseV > best.riseV) best = { riseV, fromV: first.deltaEpV as number, toV: last.deltaEpV as number };
  }
  return best;
}

export function defaultsUsed(key: string, cell: ResolvedCell, series: SeriesAnalysis): { used: DefaultUsed[]; warnings: RunWarning[] } {
  const used: DefaultUsed[] = [];
  const hasD = series.couples.some((c) => c.diffusion !== null);
  const hasGamma = series.couples.some((c) => c.surface?.coverageFromChargeMolPerCm2 != null || c.surface?.coverageFromSlopeMolPerCm2 != null);
  const hasK0 = series.couples.some((c) => c.rateConstant?.k0CmPerS != null || c.rateConstant?.lowerBoundCmPerS != null);
  if (isDefault(cell, 'areaCm2') && cell.areaCm2 !== null && (hasD || hasGamma)) {
    used.push({ field: 'areaCm2', value: `${cell.areaCm2} cm²`, affects: [...(hasD ? ['D', 'k°'] : []), ...(hasGamma ? ['Γ'] : [])] });
  }
  if (isDefault(cell, 'concentrationMolPerCm3') && cell.concentrationMolPerCm3 !== null && hasD) {
    used.push({ field: 'concentrationMolPerCm3', value: `${cell.concentrationMolPerCm3 * 1e6} mM`, affects: ['D', 'k°'] });
  }
  const rise = deltaEpRise(series);
  if (isDefault(cell, 'ruOhm') && cell.ruOhm === 0 && rise && rise.riseV > 0.01 / cell.electronCount && hasK0) {
    used.push({ field: 'ruOhm', value: 'Ru = 0 Ω (not given)', affects: ['k°'] });
  }
  const warnings: RunWarning[] = used.map((u) => ({ code: 'DEFAULT', series: key, message: messageOf(u, rise) }));
  return { used, warnings };
}

function messageOf(u: DefaultUsed, rise: ReturnType<typeof deltaEpRise>): string {
  if (u.field === 'ruOhm' && rise) {
    return `Ru is not set, while ΔEp grows from ${formatMillivolts(rise.fromV)} to ${formatMillivolts(rise.toV)} with the scan rate: uncompensated resistance widens ΔEp as slow kinetics do, so k° may be too low (a lower bound at best); give the cell's Ru`;
  }
  const what = u.field === 'areaCm2' ? 'electrode area' : 'concentration';
  return `${u.affects.join(', ')} rest on the default ${what} (${u.value}), which no file states and nobody entered`;
}
