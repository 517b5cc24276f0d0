/**
 * Scan rate written into a file name, as labs name their series: "series2_50mVs.csv",
 * "scan-0.1Vps.txt", "ferro_100mV-s_cycle3.dat", "run 0p05 V s-1.txt", "fc_250mVpers.csv",
 * "film_50mVs-1.txt", "run_v=0.1Vs_2.csv", "cv_0.05V·s⁻¹.txt".
 * Naming habits: common practice, no source. Returns V/s, or null when the name holds no rate.
 */
export interface FileNameScanRate {
  scanRateVPerS: number;
  /** The part of the name that was read. */
  match: string;
}

const PATTERN = /(?:^|[^\d.])(\d+(?:[.,p]\d+)?)\s*[-_ ]?\s*(m|µ|μ|u)?V\s*(?:\/|_|-|\s|·|\.)?\s*(?:p(?:er)?\s*)?s(?:ec)?(?:\^?-1|⁻¹)?(?![a-z])/i;

export function scanRateFromFileName(fileName: string): FileNameScanRate | null {
  const base = fileName.replace(/^.*[\\/]/, '').replace(/\.[a-z0-9]{1,5}$/i, '');
  const m = PATTERN.exec(base);
  if (!m) return null;
  const value = Number((m[1] as string).replace(/[,p]/i, '.'));
  const prefix = (m[2] ?? '').toLowerCase().replace('μ', 'µ');
  const factor = prefix === 'm' ? 1e-3 : prefix === '' ? 1 : 1e-6;
  const v = value * factor;
  if (!(v > 0) || !Number.isFinite(v)) return null;
  return { scanRateVPerS: v, match: m[0].replace(/^[^\d]/, '') };
}
