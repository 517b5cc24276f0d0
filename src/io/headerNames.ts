/**
 * Reads a column header such as "Potential/V", "E (mV)", "WE potential [V]", "I (uA)",
 * "i / µA", "j (mA cm-2)", "Time (s)", "t/ms", "Cycle", "Charge/C" into a role and a unit, with a
 * reference scale when one is written ("E / V vs. SCE", "E_we vs Fc/Fc+", "Potential (V vs
 * Ag/AgCl)"). A units row under (or over) the names gives the unit instead ("E" over "V RHE").
 * Names in English, German, Spanish, French, Italian, Portuguese and Polish. Naming habits of
 * exports and the words labs use: common practice, no source.
 */
import { parseUnit } from './units';
import type { ParsedUnit } from './units';
import { splitUnitReference } from './unitReference';
import type { ColumnRole } from './types';

export interface HeaderReading {
  label: string;
  unit: ParsedUnit | null;
  /** Raw unit text as written, '' when none. */
  unitText: string;
  /** Where the unit was read: the name itself or the units row. */
  unitFrom: 'name' | 'units row' | null;
  role: ColumnRole | null;
  /** A current density: a per-area unit, or a name such as "j" or "Stromdichte". */
  density: boolean;
  /** A second working electrode or a second copy of a role ("I2", "WE2 current"). */
  secondary: boolean;
  /** An instrument setting, not a measured value ("Current range (A)", "Gain", "I set (A)"). */
  setting: boolean;
  /**
   * A potential whose name marks the value the instrument was told to apply ("Set potential",
   * "Potential applied", "E programmed", "Control potential"), not the one it measured. Still a
   * potential; of two potential columns the other one is used (assignColumns.ts).
   */
  setValue: boolean;
  /** The role was read from the name's words ("Current"), not only from its unit ("Ic (A)"). */
  roleFromName: boolean;
  /** "vs Ag/AgCl" and the like, when the header or its unit names a reference electrode. */
  reference: string | null;
  referenceFrom: 'name' | 'units row' | null;
}

const ROLE_WORDS: [ColumnRole, RegExp][] = [
  ['cycle', /^(cycle|cyc|scan|sweep|loop|zyklus|ciclo|cykl)s?\.?\s*(no\.?|number|nr\.?|#|index|count|n)?$/i],
  ['time', /^(time|t|elapsed\s*time|elapsed|timestamp|time\s*elapsed|runtime|zeit|tiempo|temps|tempo|czas)$/i],
  ['potential', /^(potential|e|we\s*potential|working\s*electrode\s*potential|voltage|volt|u|e\s*applied|applied\s*potential|e\s*measured|measured\s*potential|e\s*we|ewe|v|e1|potential\s*applied|potential\s*measured|spannung|potenzial|potencial|voltaje|tensi[oó]n|potentiel|potenziale|tensione|voltaggio|tens[aã]o|voltagem|potencja[lł]|napi[eę]cie)$/i],
  ['current', /^(current|i|i\s*we|we\s*current|working\s*electrode\s*current|amps?|i1|current\s*1|cell\s*current|current\s*measured|strom|stromst[aä]rke|corriente|intensidad|courant|intensit[eé]|corrente|intensit[aà]|intensidade|pr[aą]d|nat[eę][zż]enie(\s*pr[aą]du)?)$/i],
  ['index', /^(index|idx|point|points|pt|no\.?|nr\.?|#|n|row|number|data\s*point|sample)$/i],
];

const DENSITY_WORDS = /^(j|j\s*we|current\s*density|density|stromdichte|densidad\s*de\s*corriente|densit[eé]\s*de\s*courant|densit[aà]\s*di\s*corrente|densidade\s*de\s*corrente|g[eę]sto[sś][cć]\s*pr[aą]du)$/i;

const MAX_NAME_CHARS = 200;

const SECONDARY = /^(i2|current\s*2|we\s*2\s*current|e2|we\s*2\s*potential|potential\s*2|j2)$/i;
const OTHER_WORDS = /charge|\bq\b|step|\bstep\b|temperature|temp|ece|counter|power|resistance|freq|phase|ox\/red|control|status|flag|mode|comment|\breal\b|\bimag(inary)?\b|modulus|impedance|admittance|\bz\s*(['′″"]|re\b|im\b|real|imag)|\b(re|im)\s*\(\s*z\s*\)|\|\s*z\s*\|/i;
/**
 * Settings of the instrument, written as columns beside the measured values: a current range, a
 * gain, a sensitivity, a compliance or limit; for a current also a set, applied or target value
 * (in a voltammogram the current is measured, the potential is the one applied). Common
 * practice, no source.
 */
const SETTING_WORDS = /\b(range|gain|sensitivity|compliance|limits?|set\s*point|setpoint|bereich|verst[äa]rkung|empfindlichkeit|rango|ganancia|gamme|gamma|intervalo|zakres)\b/i;
const CURRENT_SET_WORDS = /\b(set|applied|imposed|target|control(led)?|soll)\b/i;
/** Words that mark a potential as the instrument's program rather than its measurement (common practice, no source). */
const POTENTIAL_SET_WORDS = /\b(set|applied|imposed|programm?ed|command(ed)?|control(led)?|nominal|target|soll|vorgabe|aplicad[oa]|impos[eé]e?|applicat[oa]|zadan[eya])\b|\bset\s*point\b|\bsetpoint\b/i;
const VS = /\s+(?:vs\.?|versus|gegen)\s+([^()[\]]+?)(?=\s*[[(]|\s*\/\s*[kmµuμ]?V\b|$)/i;

/** Splits "E vs Ag/AgCl (mV)" into label "E", unit "mV" and reference "Ag/AgCl"; `unitCell` is the units row's entry. */
export function readHeader(raw: string, unitCell = ''): HeaderReading {
  // No column name is longer; the cap keeps the patterns below linear on hostile input.
  let text = raw.slice(0, MAX_NAME_CHARS).trim().replace(/^["']|["']$/g, '').trim();
  let reference: string | null = null;
  const vs = VS.exec(text);
  if (vs) {
    reference = (vs[1] as string).trim();
    text = (text.slice(0, vs.index) + text.slice(vs.index + vs[0].length)).trim();
  }
  const named = splitUnit(text);
  const fromRow = unitCell.trim() ? splitUnitReference(unitCell.slice(0, MAX_NAME_CHARS)) : null;
  const rowUnit = fromRow ? parseUnit(fromRow.unitText) : null;
  const unit = rowUnit ?? named.unit;
  const label = named.label.replace(/_/g, ' ').replace(/\s+/g, ' ').trim();
  const secondary = SECONDARY.test(label);
  const density = unit?.kind === 'currentDensity' || (DENSITY_WORDS.test(label) && unit?.kind !== 'current');
  let role: ColumnRole | null = DENSITY_WORDS.test(label) ? 'current' : null;
  for (const [r, re] of ROLE_WORDS) if (!role && re.test(label)) role = r;
  const roleFromName = role !== null;
  if (secondary) role = 'other';
  if (!role && unit) role = roleOfUnit(unit);
  const setValue = role === 'potential' && POTENTIAL_SET_WORDS.test(label);
  // A potential's set point is its applied value, read as a set potential rather than a setting.
  const setting = role !== 'time' && role !== 'cycle' && !setValue && (SETTING_WORDS.test(label) || (role === 'current' && CURRENT_SET_WORDS.test(label)));
  if (setting) role = 'other';
  if (!role && (OTHER_WORDS.test(label) || unit?.kind === 'charge')) role = 'other';
  return {
    label, unit, density, secondary, setting, setValue, role, roleFromName,
    unitText: rowUnit ? unitCell.trim() : named.unitText,
    unitFrom: rowUnit ? 'units row' : named.unit ? 'name' : null,
    reference: reference ?? fromRow?.reference ?? named.reference,
    referenceFrom: reference || (!fromRow?.reference && named.reference) ? 'name' : fromRow?.reference ? 'units row' : null,
  };
}

function roleOfUnit(u: ParsedUnit): ColumnRole | null {
  if (u.kind === 'potential') return 'potential';
  if (u.kind === 'current' || u.kind === 'currentDensity') return 'current';
  if (u.kind === 'time') return 'time';
  return 'other';
}

interface NamedUnit {
  label: string;
  unitText: string;
  unit: ParsedUnit | null;
  reference: string | null;
}

/** The unit written in the name: "(mV)", "[V vs SCE]", "/ µA", "in s", a last word "mA". */
function splitUnit(text: string): NamedUnit {
  // The whole text is tried after brackets ("U (V)" is U in volts) and before slashes ("mA/cm²").
  const tries: (RegExp | null)[] = [
    /^(.*?)\s*[[(]\s*([^\])]*?)\s*[\])]\s*$/,
    null,
    /^(.*?)\s*\/\s*([^/]+(?:\/\s*(?:cm2|cm²|cm\^2|mm2|mm²))?)$/,
    /^(.*?)\s+in\s+(\S+)$/i,
    /^(.*?)[\s_]+(\S+)$/,
  ];
  for (const re of tries) {
    const m = re ? re.exec(text) : ['', '', text];
    const unitText = ((m?.[2] ?? '') as string).trim();
    // A note after the unit in the brackets: "(µA, cathodic positive)".
    const found = m && unitText ? unitIn(unitText) ?? (re === tries[0] ? unitIn(unitText.split(/[,;]/)[0] as string) : null) : null;
    if (found) return { label: ((m?.[1] ?? '') as string).trim(), unitText, ...found };
  }
  return { label: text, unitText: '', unit: null, reference: null };
}

function unitIn(t: string): { unit: ParsedUnit; reference: string | null } | null {
  const r = splitUnitReference(t);
  const unit = parseUnit(r.unitText);
  return unit ? { unit, reference: r.reference } : null;
}
