/**
 * A potential unit with the reference scale written beside it, as plotting programs and
 * instrument exports write it in a units row or a column name: "V RHE", "V vs. SCE",
 * "mV vs Ag/AgCl", "V_RHE", "V (vs Fc/Fc+)", "V gegen Ag/AgCl". Common practice, no source.
 * After "vs"/"versus"/"gegen" any name is taken; a bare word after the unit only when it is a
 * reference electrode the core knows (core/reference), so "V max" is not read as a scale.
 */
import { findReferenceElectrode } from '../core/reference/referenceElectrodes';

export interface UnitAndReference {
  /** The unit text with the reference removed ("V", "mV"), or the input when none was found. */
  unitText: string;
  /** The reference as written ("RHE", "Ag/AgCl (3 M KCl)"), or null. */
  reference: string | null;
}

const VS = /^(.*?)\s*[([{]?\s*\b(?:vs\.?|versus|gegen)\s*(.+)$/i;
const BARE = /^([kmµμu]?V)[\s_]*[([{]?\s*([^)\]}]+?)\s*[)\]}]?$/;

export function splitUnitReference(raw: string): UnitAndReference {
  // No unit entry is longer; the cap keeps the patterns linear on hostile input.
  const text = stripOuterBrackets(raw.slice(0, 200).trim());
  const vs = VS.exec(text);
  if (vs && (vs[2] as string).trim() !== '') return { unitText: (vs[1] as string).trim(), reference: cleanReference(vs[2] as string) };
  const bare = BARE.exec(text);
  if (bare && isKnownReference(bare[2] as string)) return { unitText: bare[1] as string, reference: cleanReference(bare[2] as string) };
  return { unitText: text, reference: null };
}

/** True when the core's table of reference electrodes knows the name ("RHE", "Ag/AgCl", "Fc/Fc+"). */
export function isKnownReference(name: string): boolean {
  const n = name.trim();
  return n !== '' && (findReferenceElectrode(n) ?? findReferenceElectrode(n.replace(/[(),]/g, ' ').trim())) !== null;
}

function stripOuterBrackets(t: string): string {
  const m = /^[([{]\s*(.*?)\s*[)\]}]$/.exec(t);
  return m && !/[()[\]{}]/.test(m[1] as string) ? (m[1] as string) : t;
}

/** "Ag/AgCl)" → "Ag/AgCl"; brackets are kept only when they pair up ("Ag/AgCl (3 M KCl)"). */
function cleanReference(r: string): string {
  let t = r.trim().replace(/^[_{[(]+/, '');
  while (/[)\]}]$/.test(t) && count(t, /[([{]/g) < count(t, /[)\]}]/g)) t = t.slice(0, -1).trim();
  return t;
}

function count(t: string, re: RegExp): number {
  return t.match(re)?.length ?? 0;
}
