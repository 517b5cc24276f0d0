/**
 * A scan rate written in the text above the table or in a column name: "Scan rate: 50 mV s-1",
 * "Scan rate (mV/s): 250", "v = 0.1 V·s⁻¹", "Vorschubgeschwindigkeit: 50 mV/s", "j @ 50 mVs-1".
 * Words for "scan rate" in English, German, Spanish, French, Italian, Portuguese and Polish, and
 * the ways units are written (/, space, ·, ., s-1, s⁻¹, ps): common practice, no source.
 */
import { NUMBER_PATTERN } from './textLines';
import type { PreambleValue } from './types';
import { scanRateUnitFactor } from './units';

const RATE_WORDS = /(scan|sweep)[\s_.-]*rate|scanrate|sweeprate|^\s*v\s*[=:([]|vorschub|scangeschwindigkeit|velocidad\s+de\s+(barrido|escaneo|exploraci[oó]n)|vitesse\s+de\s+(balayage|scan)|velocit[aà]\s+di\s+scansione|(velocidade|taxa)\s+de\s+(varredura|varrimento)|szybko[sś][cć]\s+(skanowania|polaryzacji|przemiatania)/i;

/** A potential per time unit as written: mV/s, mV s-1, V·s⁻¹, mVs-1, mV.s-1, Vps (checked by scanRateUnitFactor). */
const RATE_UNIT = '([mµμu]?V\\s*(?:[/.·*]\\s*)?(?:s(?:ec)?(?:\\s*\\^?\\s*[-−⁻]\\s*[1¹])?|ps)(?![a-z]))';
const VALUE_WITH_UNIT = new RegExp(`${NUMBER_PATTERN}\\s*\\(?\\s*${RATE_UNIT}`, 'i');
const UNIT_IN_KEY = new RegExp(`[([]\\s*${RATE_UNIT}\\s*[)\\]]`, 'i');
const VALUE_AFTER_KEY = new RegExp(`[:=\\t;,]\\s*${NUMBER_PATTERN}`);

const toNumber = (s: string) => Number(s.replace(',', '.'));

/** A preamble line that names the scan rate; null when it does not, or gives no unit. */
export function readScanRateLine(text: string, line: number): PreambleValue | null {
  if (!RATE_WORDS.test(text)) return null;
  const inline = scanRateIn(text, line);
  if (inline) return inline;
  // The unit may stand in the key, "Scan rate (mV s-1): 100", or be missing (then nothing is guessed).
  const unit = UNIT_IN_KEY.exec(text);
  const num = VALUE_AFTER_KEY.exec(text);
  const f = unit ? scanRateUnitFactor(unit[1] as string) : null;
  if (!num || f === null) return null;
  return positive(toNumber(num[1] as string) * f, line, text);
}

/**
 * A line that names the scan rate and gives a number but no unit ("Scan rate: 50"): not read as a
 * rate (50 could be mV/s or V/s), but kept so the import can say it saw the line and why it did
 * not use it. Null when the line is no such line or does give a unit.
 */
export function unitlessScanRateLine(text: string, line: number): PreambleValue | null {
  if (!RATE_WORDS.test(text) || readScanRateLine(text, line) || UNIT_IN_KEY.test(text)) return null;
  const num = VALUE_AFTER_KEY.exec(text);
  return num ? positive(toNumber(num[1] as string), line, text) : null;
}

/** A number followed by a scan-rate unit anywhere in the text ("j @ 50 mVs-1 (mA cm-2)"). */
export function scanRateIn(text: string, line: number): PreambleValue | null {
  const m = VALUE_WITH_UNIT.exec(text);
  const f = m ? scanRateUnitFactor(m[2] as string) : null;
  return m && f !== null ? positive(toNumber(m[1] as string) * f, line, text) : null;
}

function positive(value: number, line: number, text: string): PreambleValue | null {
  return Number.isFinite(value) && value > 0 ? { value, line, text } : null;
}
