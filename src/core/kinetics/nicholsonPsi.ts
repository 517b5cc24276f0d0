/**
 * Nicholson's kinetic parameter ψ from the peak separation of a quasi-reversible couple.
 * In: deltaEpV (Epa − Epc, V, > 0), electronCount n, temperatureK. Out: ψ (pure number) and how
 *   it was obtained.
 * Sources:
 *   table — R. S. Nicholson, Anal. Chem. 37, 1351 (1965), Table I (α = 0.5, 25 °C, switching
 *     112.5/n mV past E½; reproduced in Bard & Faulkner 2nd ed. Table 6.5.2; values from memory);
 *   fit — ψ = (−0.6288 + 0.0021·X)/(1 − 0.017·X), X = n·ΔEp in mV, I. Lavagnini, R. Antiochia,
 *     F. Magno, Electroanalysis 16, 505 (2004) (as widely quoted, from memory).
 * Choices (design, not from the sources): X is first brought to 25 °C, X₂₅ = X·298.15/T, because
 *   the working curve is a function of nFΔEp/RT. The default is the table itself (monotone cubic
 *   Hermite interpolation of ln ψ against X, Fritsch & Carlson, SIAM J. Numer. Anal. 17, 238
 *   (1980)) over 61–212 mV. The fit is only a choice ('lavagnini', 63–141 mV): it runs up to 6.6 %
 *   above the table (72 mV) and would jump by 5 % where it hands over to the table at 141 mV.
 *   Outside its range ψ is not determinable by this method (too close to reversible, or
 *   irreversible) and the function throws OUT_OF_RANGE.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';
import { STANDARD_TEMPERATURE_K } from '../constants';

/** Nicholson (1965) Table I: n·ΔEp (mV) and ψ. */
export const NICHOLSON_TABLE: ReadonlyArray<{ nDeltaEpMv: number; psi: number }> = [
  { nDeltaEpMv: 61, psi: 20 }, { nDeltaEpMv: 63, psi: 7 }, { nDeltaEpMv: 64, psi: 6 }, { nDeltaEpMv: 65, psi: 5 },
  { nDeltaEpMv: 66, psi: 4 }, { nDeltaEpMv: 68, psi: 3 }, { nDeltaEpMv: 72, psi: 2 }, { nDeltaEpMv: 84, psi: 1 },
  { nDeltaEpMv: 92, psi: 0.75 }, { nDeltaEpMv: 105, psi: 0.5 }, { nDeltaEpMv: 121, psi: 0.35 },
  { nDeltaEpMv: 141, psi: 0.25 }, { nDeltaEpMv: 212, psi: 0.1 },
];

export const TABLE_RANGE_MV: [number, number] = [61, 212];
export const LAVAGNINI_RANGE_MV: [number, number] = [63, 141];

export type NicholsonPsiMethod = 'table' | 'lavagnini';

export interface NicholsonPsiOptions {
  /** Electrons per molecule. @default 1 */
  electronCount?: number;
  /** Temperature in K; ΔEp is scaled to 25 °C before the look-up. @default 298.15 */
  temperatureK?: number;
  /** 'table': Nicholson's table, interpolated (61–212 mV); 'lavagnini': the 2004 fit (63–141 mV). @default 'table' */
  method?: NicholsonPsiMethod;
}

export interface NicholsonPsiResult {
  psi: number;
  /** What produced ψ. */
  source: 'nicholson-1965-table' | 'lavagnini-2004-fit';
  /** n·ΔEp scaled to 25 °C, in mV. */
  nDeltaEpMv25: number;
}

/** The Lavagnini et al. (2004) fit, without range checks. X in mV. */
export function lavagniniPsi(nDeltaEpMv: number): number {
  return (-0.6288 + 0.0021 * nDeltaEpMv) / (1 - 0.017 * nDeltaEpMv);
}

/** Fritsch–Carlson slopes of a monotone cubic Hermite interpolant. */
function monotoneSlopes(x: number[], y: number[]): number[] {
  const n = x.length;
  const d = Array.from({ length: n - 1 }, (_, k) => ((y[k + 1] as number) - (y[k] as number)) / ((x[k + 1] as number) - (x[k] as number)));
  const m = x.map((_, k) => {
    if (k === 0) return d[0] as number;
    if (k === n - 1) return d[n - 2] as number;
    const a = d[k - 1] as number;
    const b = d[k] as number;
    return a * b <= 0 ? 0 : (a + b) / 2;
  });
  for (let k = 0; k < n - 1; k++) {
    const dk = d[k] as number;
    if (dk === 0) { m[k] = 0; m[k + 1] = 0; continue; }
    const a = (m[k] as number) / dk;
    const b = (m[k + 1] as number) / dk;
    const s = a * a + b * b;
    if (s > 9) { const t = 3 / Math.sqrt(s); m[k] = t * a * dk; m[k + 1] = t * b * dk; }
  }
  return m;
}

const TABLE_X = NICHOLSON_TABLE.map((r) => r.nDeltaEpMv);
const TABLE_LNPSI = NICHOLSON_TABLE.map((r) => Math.log(r.psi));
const TABLE_SLOPES = monotoneSlopes(TABLE_X, TABLE_LNPSI);

/** ψ from Nicholson's table, interpolated monotonically in ln ψ; X in mV inside 61–212. */
export function nicholsonTablePsi(nDeltaEpMv: number): number {
  let k = 0;
  while (k < TABLE_X.length - 2 && nDeltaEpMv > (TABLE_X[k + 1] as number)) k++;
  const x0 = TABLE_X[k] as number;
  const h = (TABLE_X[k + 1] as number) - x0;
  const t = (nDeltaEpMv - x0) / h;
  const h00 = (1 + 2 * t) * (1 - t) ** 2;
  const h10 = t * (1 - t) ** 2;
  const h01 = t * t * (3 - 2 * t);
  const h11 = t * t * (t - 1);
  const y = h00 * (TABLE_LNPSI[k] as number) + h10 * h * (TABLE_SLOPES[k] as number)
    + h01 * (TABLE_LNPSI[k + 1] as number) + h11 * h * (TABLE_SLOPES[k + 1] as number);
  return Math.exp(y);
}

export function nicholsonPsi(deltaEpV: number, options: NicholsonPsiOptions = {}): NicholsonPsiResult {
  const n = options.electronCount ?? 1;
  const temperatureK = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  const method = options.method ?? 'table';
  assertFiniteInRange('deltaEpV', deltaEpV);
  assertFiniteInRange('electronCount', n, Number.MIN_VALUE);
  assertFiniteInRange('temperatureK', temperatureK, Number.MIN_VALUE);
  const x = n * deltaEpV * 1000 * (STANDARD_TEMPERATURE_K / temperatureK);
  const inFit = x >= LAVAGNINI_RANGE_MV[0] && x <= LAVAGNINI_RANGE_MV[1];
  const inTable = x >= TABLE_RANGE_MV[0] && x <= TABLE_RANGE_MV[1];
  if (method === 'lavagnini') {
    if (!inFit) throw outOfRange(x, LAVAGNINI_RANGE_MV, 'the Lavagnini et al. (2004) fit');
    return { psi: lavagniniPsi(x), source: 'lavagnini-2004-fit', nDeltaEpMv25: x };
  }
  if (!inTable) throw outOfRange(x, TABLE_RANGE_MV, "Nicholson's table");
  return { psi: nicholsonTablePsi(x), source: 'nicholson-1965-table', nDeltaEpMv25: x };
}

/**
 * The ψ method a reading at X = n·ΔEp (mV, 25 °C) can use: the Lavagnini fit only inside its own
 * 63–141 mV when it was asked for, Nicholson's table otherwise (the table spans 61–212 mV, so a
 * file beyond the fit's range still gets ψ, from the source the fit itself approximates).
 */
export function psiMethodInRange(nDeltaEpMv25: number, asked: NicholsonPsiMethod): NicholsonPsiMethod {
  return asked === 'lavagnini' && nDeltaEpMv25 >= LAVAGNINI_RANGE_MV[0] && nDeltaEpMv25 <= LAVAGNINI_RANGE_MV[1] ? 'lavagnini' : 'table';
}

function outOfRange(x: number, range: [number, number], what: string): AnalysisError {
  const side = x < range[0] ? 'too close to the reversible limit' : 'too wide (treat the couple as irreversible)';
  return new AnalysisError(
    'OUT_OF_RANGE',
    `n·ΔEp = ${x.toFixed(1)} mV (at 25 °C) lies outside ${range[0]}–${range[1]} mV of ${what}: ${side}; k° is not determinable by this method`,
  );
}
