/**
 * Reads a reference-electrode name as files and people write it ("Ag/AgCl (3 M KCl)",
 * "Ag|AgCl|KCl(sat)", "Hg/Hg2Cl2 (1 M KCl)", "saturated calomel electrode (SCE)", the table's own
 * labels) into a table entry: the electrode family, its filling salt and the filling's
 * concentration, each looked up on its own, never by similarity of spelling.
 * In: the name. Out: the entry, or null with the reason; and, when the name leaves the filling
 *   open, the assumption made and how far each other filling of the family would move a
 *   converted potential (mV, from the table).
 * A sodium chloride filling is its own electrode: calomel in saturated NaCl is the SSCE (Bard &
 * Faulkner 2001, inside back cover); Ag/AgCl in NaCl has no value in the table and is refused,
 * never read as the KCl electrode of the same concentration.
 */
import { REFERENCE_ELECTRODES, type ReferenceElectrode, type ReferenceId } from './referenceElectrodes';

export interface ReferenceNameReading {
  electrode: ReferenceElectrode | null;
  /** Why a name that looks like a reference electrode has no entry; null when found or not recognised at all. */
  refusal: string | null;
  /** What the name left open and was assumed, with what the other fillings would change; null when nothing was assumed. */
  assumption: string | null;
}

type Family = 'agcl' | 'calomel' | 'mse' | 'hgo';
type Salt = 'kcl' | 'nacl' | 'k2so4' | 'h2so4' | 'naoh' | 'koh';

/** (family, salt, concentration) → table id; concentration 'sat' or the molarity as written by normalizeReferenceName. */
const FILLINGS: Record<Family, Partial<Record<Salt, Record<string, ReferenceId>>>> = {
  agcl: { kcl: { sat: 'AgCl-sat', '3.5m': 'AgCl-3.5M', '3m': 'AgCl-3M', '1m': 'AgCl-1M', '0.1m': 'AgCl-0.1M' } },
  calomel: { kcl: { sat: 'SCE', '1m': 'NCE', '0.1m': 'calomel-0.1M' }, nacl: { sat: 'SSCE' } },
  mse: { k2so4: { sat: 'MSE-sat' }, h2so4: { '1m': 'MSE-1M-H2SO4' } },
  hgo: { naoh: { '1m': 'HgO-1M', '0.1m': 'HgO-0.1M' }, koh: { '1m': 'HgO-1M-KOH', '0.1m': 'HgO-0.1M-KOH' } },
};
/** What a name that leaves the filling open is taken as (the filling most papers mean; common practice, no source). */
const ASSUMED: Record<Family, { salt: Salt; conc: string }> = {
  agcl: { salt: 'kcl', conc: 'sat' }, calomel: { salt: 'kcl', conc: 'sat' }, mse: { salt: 'k2so4', conc: 'sat' }, hgo: { salt: 'naoh', conc: '1m' },
};
const FAMILY_WORDS: Record<Family, string> = { agcl: 'Ag/AgCl', calomel: 'calomel (Hg/Hg₂Cl₂)', mse: 'Hg/Hg₂SO₄', hgo: 'Hg/HgO' };
const SALT_WORDS: Record<Salt, string> = { kcl: 'KCl', nacl: 'NaCl', k2so4: 'K₂SO₄', h2so4: 'H₂SO₄', naoh: 'NaOH', koh: 'KOH' };

const byId = (id: ReferenceId) => REFERENCE_ELECTRODES.find((r) => r.id === id) as ReferenceElectrode;

/**
 * Folds the many ways a file or a person writes an electrode name into one form:
 * "vs. Ag/AgCl (3 M KCl)", "Ag/AgCl, 3.0M KCl" and "ag/agcl 3m kcl" all become "ag/agcl 3m kcl";
 * "saturated"/"sat." become "sat"; subscripts and superscripts become plain digits and signs.
 */
export function normalizeReferenceName(name: string): string {
  return name
    .toLowerCase()
    .replace(/[₀-₉]/g, (c) => String(c.charCodeAt(0) - 0x2080))
    .replace(/⁺/g, '+')
    .trim()
    .replace(/^vs\.?\s+/, '')
    .replace(/[()[\],;]/g, ' ')
    .replace(/\bsaturated\b|\bsat\b\.?/g, 'sat')
    .replace(/(\d+(?:\.\d*)?)\s*(m|mol\/l)\b/g, (_m, num: string) => `${String(Number(num))}m`)
    .replace(/\s+/g, ' ')
    .trim();
}

let exactMap: Map<string, ReferenceElectrode> | null = null;

/** Every id and alias of the table, normalised once (a lookup runs for each header and preamble line of each file read). */
function exactAliases(): Map<string, ReferenceElectrode> {
  if (exactMap) return exactMap;
  const map = new Map<string, ReferenceElectrode>();
  for (const r of REFERENCE_ELECTRODES) {
    for (const a of [r.id, r.label, ...r.aliases]) {
      const n = normalizeReferenceName(a);
      if (!map.has(n)) map.set(n, r);
    }
  }
  return (exactMap = map);
}

/** Looks a reference electrode up by id, alias or a written name (case-insensitive); null when unknown. */
export function findReferenceElectrode(name: string): ReferenceElectrode | null {
  return readReferenceName(name).electrode;
}

/** The whole reading of a name: the entry, or why there is none, and what was assumed. */
export function readReferenceName(name: string): ReferenceNameReading {
  const key = normalizeReferenceName(name);
  const exact = exactAliases().get(key);
  if (exact) return { electrode: exact, refusal: null, assumption: exact.id === 'SHE' && /\bnhe\b|normal hydrogen/.test(key) ? nheNote() : null };
  const loose = byKeyword(key);
  if (loose) return { electrode: loose, refusal: null, assumption: loose.id === 'SHE' && /\bnhe\b|normal hydrogen/.test(key) ? nheNote() : null };
  const family = familyOf(key);
  return family ? byFilling(name, key, family) : { electrode: null, refusal: null, assumption: null };
}

const nheNote = () => `NHE read as SHE: ${byId('SHE').note ?? ''}`;

/**
 * Scales named by a word rather than a filling: a bare wire (pseudo-reference), Ag/Ag⁺, the
 * hydrogen electrodes and ferrocene. A wire coated with AgCl used as a quasi-reference is a wire.
 */
function byKeyword(key: string): ReferenceElectrode | null {
  const id: ReferenceId | null = /\bpseudo|\bquasi|\bqre\b|\b(ag|silver|pt|platinum) wire\b/.test(key) ? 'pseudo'
    : /ag\s*\/\s*ag\s*\+|agno3/.test(key) ? 'AgAg+'
      : /\brhe\b|reversible hydrogen/.test(key) ? 'RHE'
        : /\b(she|nhe)\b|standard hydrogen|normal hydrogen/.test(key) ? 'SHE'
          : /\bfc\b|ferrocen/.test(key) ? 'Fc' : null;
  return id ? byId(id) : null;
}

function familyOf(key: string): Family | null {
  if (/ag\s*[/|]\s*agcl|\bagcl\b|silver chloride/.test(key)) return 'agcl';
  if (/hg2so4|mercurous sulfate|\bmse\b/.test(key)) return 'mse';
  if (/hg\s*[/|]\s*hgo|\bhgo\b|\bmmo\b|mercur\w* oxide/.test(key)) return 'hgo';
  if (/calomel|hg2cl2|\bs?sce\b|\bnce\b/.test(key)) return 'calomel';
  return null;
}

const SALT = '(kcl|nacl|k2so4|h2so4|naoh|koh)';
const CONC = '(sat|\\d+(?:\\.\\d+)?m|\\d+(?:\\.\\d+)?\\s*mm)';

/** The filling written next to its salt ("3m kcl", "kcl 3m", "kcl sat"), else each on its own. */
function fillingOf(key: string, family: Family): { salt: Salt | null; conc: string | null } {
  const before = new RegExp(`${CONC}\\s*${SALT}\\b`).exec(key);
  if (before) return { salt: before[2] as Salt, conc: before[1] as string };
  const after = new RegExp(`\\b${SALT}\\s*${CONC}`).exec(key);
  if (after) return { salt: after[1] as Salt, conc: after[2] as string };
  const salt = (new RegExp(`\\b${SALT}\\b`).exec(key)?.[1] ?? null) as Salt | null;
  let conc = new RegExp(`(?:^|\\s|/)${CONC}(?:\\s|$)`).exec(key)?.[1] ?? null;
  // The name itself can state the filling: SCE and SSCE are saturated, NCE is 1 M KCl.
  if (family === 'calomel' && conc === null) conc = /\bs?sce\b/.test(key) ? 'sat' : /\bnce\b/.test(key) ? '1m' : null;
  if (family === 'calomel' && salt === null && /\bssce\b/.test(key)) return { salt: 'nacl', conc: 'sat' };
  if (family === 'calomel' && salt === null && /\b(sce|nce)\b/.test(key)) return { salt: 'kcl', conc };
  return { salt, conc };
}

function byFilling(name: string, key: string, family: Family): ReferenceNameReading {
  const found = fillingOf(key, family);
  const assumed = ASSUMED[family];
  const salt = found.salt ?? assumed.salt;
  const conc = found.conc ?? assumed.conc;
  const fillings = FILLINGS[family];
  const id = fillings[salt]?.[conc];
  if (!id) return { electrode: null, refusal: refusalOf(family, salt, conc), assumption: null };
  const electrode = byId(id);
  const left = [found.salt === null ? 'salt' : '', found.conc === null ? 'concentration' : ''].filter(Boolean);
  let assumption = left.length ? assumptionOf(name, family, electrode, left) : null;
  if (family === 'calomel' && /\bsce\b/.test(key) && salt === 'nacl') assumption = `"${name}" names SCE with an NaCl filling: read as the SSCE (calomel in saturated NaCl, ${electrode.eVsSheV} V vs SHE), 5 mV below the SCE`;
  if (/double junction|bridge/.test(key)) {
    const bridge = `"${name}": the bridge electrolyte of a double junction adds its own liquid-junction potential, which no table value includes`;
    assumption = assumption ? `${assumption}; ${bridge}` : bridge;
  }
  return { electrode, refusal: null, assumption };
}

function refusalOf(family: Family, salt: Salt, conc: string): string {
  const known = Object.entries(FILLINGS[family]).flatMap(([s, cs]) => Object.keys(cs).map((c) => `${c === 'sat' ? 'sat.' : concentrationWords(c)} ${SALT_WORDS[s as Salt]}`));
  const why = family === 'agcl' && salt === 'nacl'
    ? `Ag/AgCl with an NaCl filling is its own electrode (its chloride activity is not that of KCl of the same concentration) and the table has no published value for it`
    : `the table has no ${FAMILY_WORDS[family]} electrode with ${concentrationWords(conc)} ${SALT_WORDS[salt]}`;
  return `${why} (known: ${known.join(', ')}); choose the scale by hand only if one of the table's electrodes is the one used`;
}

/** "Ag/AgCl" read as sat. KCl, with what 3.5 M … 0.1 M KCl would change (every converted potential moves by alt − chosen). */
function assumptionOf(name: string, family: Family, chosen: ReferenceElectrode, left: string[]): string {
  const others = Object.values(FILLINGS[family]).flatMap((cs) => Object.values(cs)).filter((id) => id !== chosen.id).map(byId);
  const moves = others.map((o) => `${o.label} ${signedMv((o.eVsSheV ?? 0) - (chosen.eVsSheV ?? 0))}`);
  return `"${name}" does not name its filling ${left.join(' or ')}: taken as ${chosen.label} (${chosen.eVsSheV} V vs SHE); with another filling every converted potential moves by: ${moves.join(', ')}`;
}

const concentrationWords = (conc: string) => (conc === 'sat' ? 'saturated' : /mm$/.test(conc) ? conc.replace(/\s*mm$/, ' mM') : conc.replace(/m$/, ' M'));
const signedMv = (v: number) => `${v >= 0 ? '+' : '−'}${Math.abs(v * 1000).toFixed(0)} mV`;
