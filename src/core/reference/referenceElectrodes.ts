/**
 * Table of reference electrodes: potential against the standard hydrogen electrode at 25 °C,
 * with its source and how sure we are of it.
 * Values and sources: Bard & Faulkner, Electrochemical Methods 2nd ed. (2001), inside back cover
 *   and Appendix C (standard potentials); Sawyer, Sobkowiak & Roberts, Electrochemistry for
 *   Chemists 2nd ed. (1995); "Reference Electrodes in Metal Corrosion", Int. J. Corrosion 2010,
 *   756950, Table 2 (each entry names its own; "from memory" where the source was not at hand).
 * The thermodynamic (no liquid junction) value is the default where the sources give both.
 * Hg/HgO (one basis for every filling, hgOxideElectrode.ts): E = E° − (RT/F)·ln a(OH⁻) with
 *   E°(HgO/Hg, OH⁻) = 0.0977 V and a(OH⁻) = γ±·c, no liquid junction.
 * Offsets are 25 °C values; referenceTemperature.ts moves calomel and fixed-filling Ag/AgCl
 *   electrodes to other temperatures, the others stay at 25 °C with a warning.
 * Safety: calomel, Hg/Hg₂SO₄ and Hg/HgO electrodes contain mercury (MERCURY_REFERENCES); the run
 *   warns when one is used, and the README and the UI carry the cautions.
 * Names as files and people write them are read in referenceName.ts.
 */
import { hgOxideElectrodeVsSheV, HG_OXIDE_BASIS } from './hgOxideElectrode';

export type ReferenceId =
  | 'SHE' | 'SCE' | 'NCE' | 'calomel-0.1M' | 'SSCE'
  | 'AgCl-sat' | 'AgCl-3.5M' | 'AgCl-3M' | 'AgCl-1M' | 'AgCl-0.1M'
  | 'MSE-sat' | 'MSE-1M-H2SO4' | 'HgO-1M' | 'HgO-0.1M' | 'HgO-1M-KOH' | 'HgO-0.1M-KOH'
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
const HGO_NOTE = 'activity basis without liquid junction; a junction to another electrolyte and carbonate taken up by the filling move it by several mV. Hg/HgO vs RHE in the same solution is 0.926 V whatever the pH (E° of HgO + 2H⁺ + 2e⁻ → Hg + H₂O); a potential vs SHE is never 0.926 V';

/** Electrodes that contain mercury: the run cautions when one of them is used. */
export const MERCURY_REFERENCES: readonly ReferenceId[] = ['SCE', 'NCE', 'calomel-0.1M', 'SSCE', 'MSE-sat', 'MSE-1M-H2SO4', 'HgO-1M', 'HgO-0.1M', 'HgO-1M-KOH', 'HgO-0.1M-KOH'];

/** Electrodes with an aqueous filling (a liquid junction to the cell's electrolyte). */
export const AQUEOUS_REFERENCES: readonly ReferenceId[] = [...MERCURY_REFERENCES, 'AgCl-sat', 'AgCl-3.5M', 'AgCl-3M', 'AgCl-1M', 'AgCl-0.1M'];

const hgo = (id: ReferenceId, base: 'NaOH' | 'KOH', molar: 0.1 | 1, aliases: string[]): ReferenceElectrode => ({
  id, label: `Hg/HgO, ${molar} M ${base}`, eVsSheV: Math.round(hgOxideElectrodeVsSheV(base, molar) * 1e4) / 1e4,
  source: HG_OXIDE_BASIS, status: 'from-memory', note: HGO_NOTE, aliases,
});

export const REFERENCE_ELECTRODES: readonly ReferenceElectrode[] = [
  { id: 'SHE', label: 'SHE (standard hydrogen electrode)', eVsSheV: 0, source: 'IUPAC Gold Book, "standard hydrogen electrode"', status: 'definition', note: 'NHE (the older "normal" hydrogen electrode in 1 N acid) is converted as SHE; the two are not strictly the same (common practice, no source)', aliases: ['she', 'nhe', 'vs she', 'hydrogen'] },
  { id: 'SCE', label: 'SCE (Hg/Hg₂Cl₂, sat. KCl)', eVsSheV: 0.2412, source: `${BF_COVER}; Meites (ed.), Handbook of Analytical Chemistry (1963)`, status: 'sources-disagree', note: '0.2412 V without liquid junction; 0.244 V with a typical junction (Sawyer et al. 1995)', aliases: ['sce', 'saturated calomel'] },
  { id: 'NCE', label: 'Calomel, 1 M KCl (NCE)', eVsSheV: 0.2801, source: BF_COVER, status: 'checked', note: '0.283 V with liquid junction', aliases: ['nce', 'calomel-1m', 'calomel 1 m kcl'] },
  { id: 'calomel-0.1M', label: 'Calomel, 0.1 M KCl', eVsSheV: 0.3337, source: BF_COVER, status: 'checked', note: '0.336 V with liquid junction', aliases: ['calomel-0.1m', 'calomel 0.1 m kcl'] },
  { id: 'SSCE', label: 'SSCE (calomel, sat. NaCl)', eVsSheV: 0.236, source: BF_COVER, status: 'checked', note: null, aliases: ['ssce'] },
  { id: 'AgCl-sat', label: 'Ag/AgCl, sat. KCl', eVsSheV: 0.197, source: `${BF_COVER}; ${CORROSION_2010}`, status: 'sources-disagree', note: '0.197 V without liquid junction; 0.199 V with (Sawyer et al. 1995)', aliases: ['ag/agcl sat', 'ag/agcl-sat', 'agcl-sat', 'ag/agcl sat kcl'] },
  { id: 'AgCl-3.5M', label: 'Ag/AgCl, 3.5 M KCl', eVsSheV: 0.205, source: 'Sawyer, Sobkowiak & Roberts, Electrochemistry for Chemists 2nd ed. (1995), table of reference electrodes (from memory)', status: 'from-memory', note: 'includes a liquid junction', aliases: ['ag/agcl 3.5m', 'ag/agcl-3.5m', 'agcl-3.5m'] },
  { id: 'AgCl-3M', label: 'Ag/AgCl, 3 M KCl', eVsSheV: 0.21, source: 'commonly quoted value, from memory (primary source not at hand)', status: 'from-memory', note: 'quoted 0.209–0.210 V (from memory)', aliases: ['ag/agcl 3m', 'ag/agcl-3m', 'agcl-3m', 'ag/agcl 3m kcl'] },
  { id: 'AgCl-1M', label: 'Ag/AgCl, 1 M KCl', eVsSheV: 0.236, source: CORROSION_2010, status: 'sources-disagree', note: 'also quoted 0.235 and 0.237 V', aliases: ['ag/agcl 1m', 'ag/agcl-1m', 'agcl-1m', 'ag/agcl 1m kcl'] },
  { id: 'AgCl-0.1M', label: 'Ag/AgCl, 0.1 M KCl', eVsSheV: 0.2881, source: `0.2881 V from memory (primary source not at hand); ${CORROSION_2010} gives 0.2895 V`, status: 'sources-disagree', note: 'sources differ by 1.4 mV', aliases: ['ag/agcl 0.1m', 'ag/agcl-0.1m', 'agcl-0.1m'] },
  { id: 'MSE-sat', label: 'Hg/Hg₂SO₄, sat. K₂SO₄ (MSE)', eVsSheV: 0.64, source: `${BF_COVER} (0.64 V); other handbooks give 0.65 V and 0.6513 V (from memory)`, status: 'sources-disagree', note: 'sources give 0.64–0.65 V (also 0.6513 V); ±10 mV — set your own value if you know it', aliases: ['mse', 'mse-sat', 'hg/hg2so4 sat k2so4'] },
  { id: 'MSE-1M-H2SO4', label: 'Hg/Hg₂SO₄, 1 M H₂SO₄', eVsSheV: 0.6739, source: CORROSION_2010, status: 'checked', note: null, aliases: ['mse-1m', 'hg/hg2so4 1m h2so4'] },
  hgo('HgO-1M', 'NaOH', 1, ['hgo-1m', 'hg/hgo 1m naoh']),
  hgo('HgO-0.1M', 'NaOH', 0.1, ['hgo-0.1m', 'hg/hgo 0.1m naoh']),
  hgo('HgO-1M-KOH', 'KOH', 1, ['hgo-1m-koh', 'hg/hgo 1m koh']),
  hgo('HgO-0.1M-KOH', 'KOH', 0.1, ['hgo-0.1m-koh', 'hg/hgo 0.1m koh']),
  { id: 'RHE', label: 'RHE (reversible hydrogen electrode)', eVsSheV: null, source: 'Nernst equation: E(RHE vs SHE) = −(ln 10)·RT/F·pH', status: 'depends-on-context', note: 'needs the pH of the solution', aliases: ['rhe', 'reversible hydrogen'] },
  { id: 'pseudo', label: 'pseudo-reference (bare Ag or Pt wire)', eVsSheV: null, source: 'no fixed potential: a bare wire takes a potential set by the solution (Bard & Faulkner 2nd ed. (2001) §2.1, from memory)', status: 'depends-on-context', note: 'drifts with the solution; convertible only through an internal standard (Fc⁺/Fc) measured in the same solution', aliases: ['pseudo', 'pseudo-reference', 'pseudo reference', 'pseudoreference', 'quasi-reference', 'quasi reference', 'qre', 'ag wire', 'silver wire', 'pt wire', 'platinum wire', 'ag qre', 'pt qre'] },
  { id: 'AgAg+', label: 'Ag/Ag⁺ (non-aqueous, AgNO₃ in an organic solvent)', eVsSheV: null, source: 'depends on solvent, electrolyte, AgNO₃ concentration and junction (Pavlishchuk & Addison, Inorg. Chim. Acta 298 (2000) 97, from memory)', status: 'depends-on-context', note: 'no single value vs SHE; convertible only through an internal standard (Fc⁺/Fc) measured in the same solution', aliases: ['ag/ag+', 'ag/agno3', 'ag/ag+ 0.01m', 'ag/agno3 0.01m', 'ag/ag+ 0.1m', 'ag/agno3 0.1m', 'ag/ag+ 10mm', 'agag+'] },
  { id: 'Fc', label: 'Fc⁺/Fc (internal standard)', eVsSheV: null, source: 'IUPAC recommendation of Fc⁺/Fc as internal reference (Gritzner & Kůta, Pure Appl. Chem. 56, 461 (1984), from memory)', status: 'depends-on-context', note: 'needs E½ of ferrocene measured in the same solution, or an offset', aliases: ['fc', 'fc+/fc', 'ferrocene', 'fc/fc+', 'ferrocenium'] },
];

export { findReferenceElectrode, normalizeReferenceName } from './referenceName';
