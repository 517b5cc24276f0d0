/**
 * Scan rate written into a file name, as labs name their series: "series2_50mVs.csv",
 * "scan-0.1Vps.txt", "ferro_100mV-s_cycle3.dat", "run 0p05 V s-1.txt", "fc_250mVpers.csv",
 * "film_50mVs-1.txt", "run_v=0.1Vs_2.csv", "cv_0.05V·s⁻¹.txt".
 * Naming habits: common practice, no source. Returns V/s, or null when the name holds no rate.
 *
 * "vs" is also how names say "versus" ("Fc_5_vs_AgCl", "run3_vs_Ag"), so a bare "Vs" (no prefix
 * such as mV, no "per", no "-1") counts only when it is written onto its number ("0.1Vs") and
 * either "v=" stands before it or nothing but a number or the end of the name follows it
 * ("…_0.1Vs.csv", "…_0.1Vs_2.csv"). "5_vs_AgCl", "0.1 vs SCE", "2vs_Ag" are not rates.
 */
export interface FileNameScanRate {
  scanRateVPerS: number;
  /** The part of the name that was read. */
  match: string;
}

const PATTERN = /(?:^|[^\d.])(\d+(?:[.,p]\d+)?)(\s*[-_ ]?\s*)(m|µ|μ|u)?V(\s*(?:\/|_|-|\s|·|\.)?\s*)(p(?:er)?\s*)?s(ec)?(\^?-1|⁻¹)?(?![a-z])/giu;

export function scanRateFromFileName(fileName: string): FileNameScanRate | null {
  const base = fileName.replace(/^.*[\\/]/, '').replace(/\.[a-z0-9]{1,5}$/i, '');
  for (const m of base.matchAll(PATTERN)) {
    const [whole, num, gap, prefix, join, per, sec, inverse] = m;
    const bareVs = !prefix && !join && !per && !sec && !inverse;
    if (bareVs && !isRateVs(base, m.index + whole.length, gap ?? '', base.slice(0, m.index + whole.indexOf(num as string)))) continue;
    const value = Number((num as string).replace(/[,p]/i, '.'));
    const p = (prefix ?? '').toLowerCase().replace('μ', 'µ');
    const v = value * (p === 'm' ? 1e-3 : p === '' ? 1 : 1e-6);
    if (v > 0 && Number.isFinite(v)) return { scanRateVPerS: v, match: whole.replace(/^[^\d]/, '') };
  }
  return null;
}

/** A bare "Vs" is V/s only on its number, after "v=", or before a number or the end of the name. */
function isRateVs(base: string, end: number, gap: string, before: string): boolean {
  if (gap) return false;
  if (/v\s*=\s*$/i.test(before)) return true;
  return /^(?:$|[-_ ]*\d)/.test(base.slice(end));
}
