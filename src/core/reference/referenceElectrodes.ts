/**
 * Table of reference electrodes: potential against the standard hydrogen electrode at 25 °C,
 * with its source and how sure we are of it.
 * Values and sources: Bard & Faulkner, Electrochemical Methods 2nd ed. (2001), inside back cover;
 *   Sawyer, Sobkowiak & Roberts, Electrochemistry for Chemists 2nd ed. (1995); "Reference
 *   Electrodes in Metal Corrosion", Int. J. Corrosion 2010, 756950, Table 2; Meites (ed.), Handbook
 *   of Analytical Chemistry (1963) (each entry names its own).
 * The thermodynamic (no liquid junction) value is the default where the sources give both.
 * Offsets are 25 °C values; referenceTemperature.ts moves calomel and fixed-filling Ag/AgCl
 *   electrodes to other temperatures, the others stay at 25 °C with a warning.
 * Safety: calomel, Hg/Hg₂SO₄ and Hg/HgO electrodes contain mercury; the user-facing cautions live
 *   in the README and the UI.
 */

export type ReferenceId =
  | 'SHE' | 'SCE' | 'NCE' | 'calomel-0.1M' | 'SSCE'
  | 'AgCl-sat' | 'AgCl-3.5M' | 'AgCl-3M' | 'AgCl-1M' | 'AgCl-0.1M'
  | 'MSE-sat' | 'MSE-1M-H2SO4' | 'HgO-1M' | 'HgO-0.1M'
  | 'RHE' | 'Fc' | 'pseudo' | 'AgAg+';

export type ReferenceStatus = 'checked' | 'from-memory' | 'sources-disagree' | 'definition' | 'depends-on-context';

export interface ReferenceElectrode {
  id: ReferenceId;
  label: string;
  /** E of this electrode vs SHE at 25 °C (V); null when it depends on pH or a measurement. */
  eVsSheV: number | null;
  source: string;
  status: ReferenceStatus;
  /** Spread between sources or a caution, in plain words. */
  note: string | null;
  /** Lower-case spellings accepted by findReferenceElectrode. */
  aliases: string[];
}

const CORROSION_2010 = 'Int. J. Corrosion 2010, art. 756950, Table 2';
const BF_COVER = 'Bard & Faulkner, Electrochemical Methods 2nd ed. (2001), inside back cover';

export const REFERENCE_ELECTRODES: readonly ReferenceElectrode[] = [
  { id: 'SHE', label: 'SHE (standard hydrogen electrode)', eVsSheV: 0, source: 'IUPAC Gold Book, "standard hydrogen electrode"', status: 'definition', note: 'NHE is treated as the same scale (common practice, no source)', aliases: ['she', 'nhe', 'vs she', 'hydrogen'] },
  { id: 'SCE', label: 'SCE (Hg/Hg₂Cl₂, sat. KCl)', eVsSheV: 0.2412, source: `${BF_COVER}; Meites (1963)`, status: 'sources-disagree', note: '0.2412 V without liquid junction; 0.244 V with a typical junction (Sawyer et al. 1995)', aliases: ['sce', 'calomel', 'hg/hg2cl2', 'saturated calomel'] },
  { id: 'NCE', label: 'Calomel, 1 M KCl (NCE)', eVsSheV: 0.2801, source: BF_COVER, status: 'checked', note: '0.283 V with liquid junction', aliases: ['nce', 'calomel-1m', 'calomel 1 m kcl'] },
  { id: 'calomel-0.1M', label: 'Calomel, 0.1 M KCl', eVsSheV: 0.3337, source: BF_COVER, status: 'checked', note: '0.336 V with liquid junction', aliases: ['calomel-0.1m', 'calomel 0.1 m kcl'] },
  { id: 'SSCE', label: 'SSCE (calomel, sat. NaCl)', eVsSheV: 0.236, source: BF_COVER, status: 'checked', note: null, aliases: ['ssce'] },
  { id: 'AgCl-sat', label: 'Ag/AgCl, sat. KCl', eVsSheV: 0.197, source: `${BF_COVER}; ${CORROSION_2010}`, status: 'sources-disagree', note: '0.197 V without liquid junction; 0.199 V with (Sawyer et al. 1995)', aliases: ['ag/agcl', 'agcl', 'ag/agcl sat', 'ag/agcl-sat', 'agcl-sat', 'ag/agcl (sat. kcl)', 'ag/agcl sat. kcl'] },
  { id: 'AgCl-3.5M', label: 'Ag/AgCl, 3.5 M KCl', eVsSheV: 0.205, source: 'Sawyer et al., Electrochemistry for Chemists 2nd ed. (1995)', status: 'checked', note: 'includes a liquid junction', aliases: ['ag/agcl 3.5m', 'ag/agcl-3.5m', 'agcl-3.5m'] },
  { id: 'AgCl-3M', label: 'Ag/AgCl, 3 M KCl', eVsSheV: 0.21, source: 'web compilation of handbook values (primary source not seen)', status: 'checked', note: null, aliases: ['ag/agcl 3m', 'ag/agcl-3m', 'agcl-3m', 'ag/agcl 3 m kcl'] },
  { id: 'AgCl-1M', label: 'Ag/AgCl, 1 M KCl', eVsSheV: 0.236, source: CORROSION_2010, status: 'sources-disagree', note: 'also quoted 0.235 and 0.237 V', aliases: ['ag/agcl 1m', 'ag/agcl-1m', 'agcl-1m', 'ag/agcl 1 m kcl'] },
  { id: 'AgCl-0.1M', label: 'Ag/AgCl, 0.1 M KCl', eVsSheV: 0.2881, source: `web compilation (0.2881 V); ${CORROSION_2010} (0.2895 V)`, status: 'sources-disagree', note: 'sources differ by 1.4 mV', aliases: ['ag/agcl 0.1m', 'ag/agcl-0.1m', 'agcl-0.1m'] },
  { id: 'MSE-sat', label: 'Hg/Hg₂SO₄, sat. K₂SO₄ (MSE)', eVsSheV: 0.64, source: 'Bard & Faulkner (0.64 V) vs an analytical handbook (0.65 V), per a web note', status: 'sources-disagree', note: 'sources give 0.64–0.65 V (also 0.6513 V); ±10 mV — set your own value if you know it', aliases: ['mse', 'hg/hg2so4', 'mercurous sulfate', 'mse-sat'] },
  { id: 'MSE-1M-H2SO4', label: 'Hg/Hg₂SO₄, 1 M H₂SO₄', eVsSheV: 0.6739, source: CORROSION_2010, status: 'checked', note: null, aliases: ['mse-1m', 'hg/hg2so4 1m h2so4'] },
  { id: 'HgO-1M', label: 'Hg/HgO, 1 M NaOH', eVsSheV: 0.098, source: 'web compilation of reference-electrode values (the value most papers use)', status: 'sources-disagree', note: 'published 0.098, 0.108 (activity calculation) and 0.140 V (with junction); ±40 mV — set your own value if you know it; 0.926 V is a cell emf, never an offset', aliases: ['hg/hgo', 'hgo', 'mmo', 'hg/hgo 1m', 'hgo-1m'] },
  { id: 'HgO-0.1M', label: 'Hg/HgO, 0.1 M NaOH', eVsSheV: 0.165, source: CORROSION_2010, status: 'checked', note: 'a compilation computes 0.164 V', aliases: ['hg/hgo 0.1m', 'hgo-0.1m'] },
  { id: 'RHE', label: 'RHE (reversible hydrogen electrode)', eVsSheV: null, source: 'Nernst equation: E(RHE vs SHE) = −(ln 10)·RT/F·pH', status: 'depends-on-context', note: 'needs the pH of the solution', aliases: ['rhe', 'reversible hydrogen'] },
  { id: 'pseudo', label: 'pseudo-reference (bare Ag or Pt wire)', eVsSheV: null, source: 'no fixed potential: a bare wire takes a potential set by the solution (Bard & Faulkner 2nd ed. (2001) §2.1, from memory)', status: 'depends-on-context', note: 'drifts with the solution; convertible only through an internal standard (Fc⁺/Fc) measured in the same solution', aliases: ['pseudo', 'pseudo-reference', 'pseudo reference', 'pseudoreference', 'quasi-reference', 'quasi reference', 'qre', 'ag wire', 'silver wire', 'pt wire', 'platinum wire', 'ag qre', 'pt qre'] },
  { id: 'AgAg+', label: 'Ag/Ag⁺ (non-aqueous, AgNO₃ in an organic solvent)', eVsSheV: null, source: 'depends on solvent, electrolyte, AgNO₃ concentration and junction (Pavlishchuk & Addison, Inorg. Chim. Acta 298 (2000) 97, from memory)', status: 'depends-on-context', note: 'no single value vs SHE; convertible only through an internal standard (Fc⁺/Fc) measured in the same solution', aliases: ['ag/ag+', 'ag/agno3', 'ag/ag+ 0.01m', 'ag/agno3 0.01m', 'ag/ag+ 0.1m', 'ag/agno3 0.1m', 'ag/ag+ 10mm', 'agag+'] },
  { id: 'Fc', label: 'Fc⁺/Fc (internal standard)', eVsSheV: null, source: 'IUPAC recommendation of Fc⁺/Fc as internal reference (Gritzner & Kůta, Pure Appl. Chem. 56, 461 (1984), from memory)', status: 'depends-on-context', note: 'needs E½ of ferrocene measured in the same solution, or an offset', aliases: ['fc', 'fc+/fc', 'ferrocene', 'fc/fc+', 'ferrocenium'] },
];

/** Looks a reference electrode up by id or alias (case-insensitive); null when unknown. */
export function findReferenceElectrode(name: string): ReferenceElectrode | null {
  const key = normalizeReferenceName(name);
  const { exact, loose } = aliasTables();
  return exact.get(key) ?? loose.get(stripElectrolyte(key)) ?? byKeyword(key);
}

/** Second pass: the filling electrolyte's name is left out, its concentration kept. */
const stripElectrolyte = (n: string) => n.replace(/ (kcl|nacl|naoh|koh|h2so4|k2so4)\b/g, '');

let aliasMaps: { exact: Map<string, ReferenceElectrode>; loose: Map<string, ReferenceElectrode> } | null = null;

/**
 * Every id and alias of the table, normalised once (a lookup runs for each header and preamble
 * line of each file read). The first electrode in table order keeps a spelling two could share.
 */
function aliasTables(): NonNullable<typeof aliasMaps> {
  if (aliasMaps) return aliasMaps;
  const exact = new Map<string, ReferenceElectrode>();
  const loose = new Map<string, ReferenceElectrode>();
  for (const r of REFERENCE_ELECTRODES) {
    for (const a of [r.id, ...r.aliases]) {
      const n = normalizeReferenceName(a);
      if (!exact.has(n)) exact.set(n, r);
      const l = stripElectrolyte(n);
      if (!loose.has(l)) loose.set(l, r);
    }
  }
  return (aliasMaps = { exact, loose });
}

/**
 * Third pass for free text such as "Ag wire pseudo-reference" or "Ag/Ag+ (0.01 M AgNO3 in MeCN)":
 * the words that name a scale without a fixed potential. Anything else stays unknown.
 */
function byKeyword(key: string): ReferenceElectrode | null {
  const id: ReferenceId | null = /\bpseudo|\bquasi|\bqre\b|\b(ag|silver|pt|platinum) wire\b/.test(key) ? 'pseudo'
    : /ag\s*\/\s*ag\s*\+|agno3/.test(key) ? 'AgAg+' : null;
  return id ? (REFERENCE_ELECTRODES.find((r) => r.id === id) ?? null) : null;
}

/**
 * Folds the many ways a file or a person writes an electrode name into one form:
 * "vs. Ag/AgCl (3 M KCl)", "Ag/AgCl, 3.0M KCl" and "ag/agcl 3m kcl" all become "ag/agcl 3m kcl";
 * "saturated"/"sat." become "sat".
 */
export function normalizeReferenceName(name: string): string {
  return name
    .toLowerCase()
    .trim()
    .replace(/^vs\.?\s+/, '')
    .replace(/[()[\],;]/g, ' ')
    .replace(/\bsaturated\b|\bsat\b\.?/g, 'sat')
    .replace(/(\d+(?:\.\d*)?)\s*(m|mol\/l)\b/g, (_m, num: string) => `${String(Number(num))}m`)
    .replace(/\s+/g, ' ')
    .trim();
}
