/**
 * Reads a column header such as "Potential/V", "E (mV)", "WE potential [V]", "I (uA)",
 * "i / µA", "current (nA)", "Time (s)", "t/ms", "Cycle", "Charge/C" into a role and a unit.
 * Naming habits of instrument exports: common practice, no source.
 */
import { parseUnit } from './units';
import type { ParsedUnit } from './units';
import type { ColumnRole } from './types';

export interface HeaderReading {
  label: string;
  unit: ParsedUnit | null;
  /** Raw unit text as written, '' when none. */
  unitText: string;
  role: ColumnRole | null;
  /** A second working electrode or a second copy of a role ("I2", "WE2 current"). */
  secondary: boolean;
  /** "vs Ag/AgCl" and the like, when the header names a reference electrode. */
  reference: string | null;
}

const ROLE_WORDS: [ColumnRole, RegExp][] = [
  ['cycle', /^(cycle|cyc|scan|sweep|loop)s?\.?\s*(no\.?|number|nr\.?|#|index|count|n)?$/i],
  ['time', /^(time|t|elapsed\s*time|elapsed|timestamp|time\s*elapsed|runtime)$/i],
  ['potential', /^(potential|e|we\s*potential|working\s*electrode\s*potential|voltage|volt|u|e\s*applied|applied\s*potential|e\s*measured|measured\s*potential|e\s*we|v|e1|potential\s*applied|potential\s*measured)$/i],
  ['current', /^(current|i|i\s*we|we\s*current|working\s*electrode\s*current|amps?|i1|current\s*1|cell\s*current|current\s*measured)$/i],
  ['index', /^(index|idx|point|points|pt|no\.?|nr\.?|#|n|row|number|data\s*point|sample)$/i],
];

const MAX_NAME_CHARS = 200;

const SECONDARY = /^(i2|current\s*2|we\s*2\s*current|e2|we\s*2\s*potential|potential\s*2)$/i;
const OTHER_WORDS = /charge|\bq\b|step|\bstep\b|temperature|temp|ece|counter|power|resistance|freq|phase|ox\/red|control|status|flag|mode|comment/i;

/** Splits "E vs Ag/AgCl (mV)" into label "E", unit "mV" and reference "Ag/AgCl". */
export function readHeader(raw: string): HeaderReading {
  // No column name is longer; the cap keeps the patterns below linear on hostile input.
  let text = raw.slice(0, MAX_NAME_CHARS).trim().replace(/^["']|["']$/g, '').trim();
  let reference: string | null = null;
  const vs = /\s+vs\.?\s+(.+?)(?=\s*[[(]|\s*\/\s*[kmµuμ]?V\b|$)/i.exec(text);
  if (vs) {
    reference = (vs[1] as string).trim();
    text = (text.slice(0, vs.index) + text.slice(vs.index + vs[0].length)).trim();
  }
  const { label, unitText } = splitUnit(text);
  const unit = unitText ? parseUnit(unitText) : null;
  const secondary = SECONDARY.test(label);
  let role: ColumnRole | null = null;
  for (const [r, re] of ROLE_WORDS) if (re.test(label)) { role = r; break; }
  if (secondary) role = 'other';
  if (!role && unit) role = roleOfUnit(unit);
  if (!role && (OTHER_WORDS.test(label) || unit?.kind === 'charge')) role = 'other';
  return { label, unit, unitText, role, secondary, reference };
}

function roleOfUnit(u: ParsedUnit): ColumnRole | null {
  if (u.kind === 'potential') return 'potential';
  if (u.kind === 'current' || u.kind === 'currentDensity') return 'current';
  if (u.kind === 'time') return 'time';
  return 'other';
}

function splitUnit(text: string): { label: string; unitText: string } {
  const bracket = /^(.*?)\s*[[(]\s*([^\])]*?)\s*[\])]\s*$/.exec(text);
  if (bracket) return { label: (bracket[1] as string).trim(), unitText: (bracket[2] as string).trim() };
  const slash = /^(.*?)\s*\/\s*([^/]+(?:\/\s*(?:cm2|cm²|cm\^2|mm2|mm²))?)$/.exec(text);
  if (slash && parseUnit(slash[2] as string)) return { label: (slash[1] as string).trim(), unitText: (slash[2] as string).trim() };
  const inWord = /^(.*?)\s+in\s+(\S+)$/i.exec(text);
  if (inWord && parseUnit(inWord[2] as string)) return { label: (inWord[1] as string).trim(), unitText: inWord[2] as string };
  const lastWord = /^(.*?)[\s_]+(\S+)$/.exec(text);
  if (lastWord && parseUnit(lastWord[2] as string)) return { label: (lastWord[1] as string).trim(), unitText: lastWord[2] as string };
  if (parseUnit(text)) return { label: '', unitText: text };
  return { label: text, unitText: '' };
}
