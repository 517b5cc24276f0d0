/**
 * Bytes → text. Recognises files that are not text at all (spreadsheet containers, images, other
 * binaries) by their leading signature bytes, honours a byte-order mark (UTF-8, UTF-16 LE/BE),
 * spots UTF-16 without a mark by its zero bytes, and falls back from UTF-8 to Latin-1 when the
 * bytes are not valid UTF-8 (a lone 0xB5 "µ" from an older instrument, for example).
 * Signatures: the ZIP local-file header "PK\3\4" (PKWARE APPNOTE.TXT, sect. 4.3.7), the OLE2
 * compound-file header D0 CF 11 E0 A1 B1 1A E1 ([MS-CFB] sect. 2.2), PNG (RFC 2083 sect. 3.1),
 * JPEG SOI FF D8 FF, GIF87a/GIF89a, BMP "BM", TIFF "II*\0"/"MM\0*", PDF "%PDF-", RIFF/WEBP.
 * BOMs: The Unicode Standard, ch. 23.8 "Specials", U+FEFF.
 */
import { ImportError } from './errors';
import type { Guess, TextEncoding } from './types';

export interface DecodedText {
  text: string;
  encoding: Guess<TextEncoding>;
}

const SIGNATURES: { bytes: number[]; code: 'SPREADSHEET_BINARY' | 'IMAGE' | 'BINARY'; what: string }[] = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], code: 'SPREADSHEET_BINARY', what: 'a ZIP container such as an .xlsx or .ods spreadsheet' },
  { bytes: [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1], code: 'SPREADSHEET_BINARY', what: 'an old-style .xls spreadsheet (OLE2 file)' },
  { bytes: [0x89, 0x50, 0x4e, 0x47], code: 'IMAGE', what: 'a PNG image' },
  { bytes: [0xff, 0xd8, 0xff], code: 'IMAGE', what: 'a JPEG image' },
  { bytes: [0x47, 0x49, 0x46, 0x38], code: 'IMAGE', what: 'a GIF image' },
  { bytes: [0x49, 0x49, 0x2a, 0x00], code: 'IMAGE', what: 'a TIFF image' },
  { bytes: [0x4d, 0x4d, 0x00, 0x2a], code: 'IMAGE', what: 'a TIFF image' },
  { bytes: [0x42, 0x4d], code: 'IMAGE', what: 'a BMP image' },
  { bytes: [0x25, 0x50, 0x44, 0x46, 0x2d], code: 'BINARY', what: 'a PDF document' },
];

const ADVICE = 'export the measurement as a text or CSV file from the instrument software and drop that instead';

/** Throws SPREADSHEET_BINARY / IMAGE / BINARY when the bytes start with a known signature. */
export function rejectKnownBinary(fileName: string, head: ArrayLike<number>): void {
  for (const sig of SIGNATURES) {
    if (sig.bytes.length <= head.length && sig.bytes.every((b, i) => head[i] === b)) {
      // "BM" is also the start of plain text such as "BM-3 electrode"; only a binary BMP has a NUL soon after.
      if (sig.what === 'a BMP image' && !hasNul(head, 64)) continue;
      throw new ImportError(sig.code, fileName, `this is ${sig.what}, not a text export; ${ADVICE}`);
    }
  }
  const riff = [0x52, 0x49, 0x46, 0x46];
  if (head.length >= 12 && riff.every((b, i) => head[i] === b) && String.fromCharCode(head[8] ?? 0, head[9] ?? 0, head[10] ?? 0, head[11] ?? 0) === 'WEBP') {
    throw new ImportError('IMAGE', fileName, `this is a WebP image, not a text export; ${ADVICE}`);
  }
}

function hasNul(bytes: ArrayLike<number>, limit: number): boolean {
  const n = Math.min(limit, bytes.length);
  // The typed array's own search: a loop here would run uncompiled on the first files of a page.
  if (bytes instanceof Uint8Array) return bytes.subarray(0, n).indexOf(0) !== -1;
  for (let i = 0; i < n; i++) if (bytes[i] === 0) return true;
  return false;
}

/** A character that plain text does not hold: C0 controls other than tab, line feed, form feed and carriage return, or U+FFFD. */
// eslint-disable-next-line no-control-regex -- control characters are exactly what this looks for
const CONTROL_CHARACTER = /[\u0000-\u0008\u000b\u000e-\u001f\ufffd]/;

/** Decodes bytes to text, choosing the encoding unless `forced` names one. */
export function decodeBytes(fileName: string, bytes: Uint8Array, forced?: TextEncoding): DecodedText {
  if (bytes.length === 0) throw new ImportError('EMPTY', fileName, 'the file is empty (0 bytes)');
  rejectKnownBinary(fileName, bytes.subarray(0, 16));
  const bom = bomOf(bytes);
  if (forced) {
    refuseOtherUtf16(fileName, bytes, forced, bom);
    return { text: decodeAs(fileName, bytes, forced), encoding: { value: forced, overridden: true, explanation: `encoding ${forced} (set by the user)` } };
  }
  if (bom) return { text: decodeAs(fileName, bytes, bom), encoding: { value: bom, overridden: false, explanation: `encoding ${bom} — the file starts with a ${bom} byte-order mark` } };
  const utf16 = guessUtf16WithoutBom(bytes);
  if (utf16) {
    return { text: decodeAs(fileName, bytes, utf16), encoding: { value: utf16, overridden: false, explanation: `encoding ${utf16} — no byte-order mark, but every other byte is zero as in UTF-16 text` } };
  }
  if (hasNul(bytes, 65536)) throw new ImportError('BINARY', fileName, `the file contains binary data (zero bytes), not text; ${ADVICE}`);
  try {
    const text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    return { text, encoding: { value: 'utf-8', overridden: false, explanation: 'encoding utf-8 — the bytes are valid UTF-8' } };
  } catch {
    return { text: decodeAs(fileName, bytes, 'latin1'), encoding: { value: 'latin1', overridden: false, explanation: 'encoding latin1 — the bytes are not valid UTF-8, read as Latin-1 (Windows-1252)' } };
  }
}

function bomOf(b: Uint8Array): TextEncoding | null {
  if (b[0] === 0xef && b[1] === 0xbb && b[2] === 0xbf) return 'utf-8';
  if (b[0] === 0xff && b[1] === 0xfe) return 'utf-16le';
  if (b[0] === 0xfe && b[1] === 0xff) return 'utf-16be';
  return null;
}

function guessUtf16WithoutBom(b: Uint8Array): TextEncoding | null {
  const n = Math.min(b.length - (b.length % 2), 4096);
  if (n < 4) return null;
  let evenZeros = 0;
  let oddZeros = 0;
  for (let i = 0; i < n; i += 2) {
    if (b[i] === 0) evenZeros++;
    if (b[i + 1] === 0) oddZeros++;
  }
  const pairs = n / 2;
  if (oddZeros > 0.9 * pairs && evenZeros < 0.1 * pairs) return 'utf-16le';
  if (evenZeros > 0.9 * pairs && oddZeros < 0.1 * pairs) return 'utf-16be';
  return null;
}

function decodeAs(fileName: string, bytes: Uint8Array, encoding: TextEncoding): string {
  const label = encoding === 'latin1' ? 'windows-1252' : encoding;
  try {
    // TextDecoder drops a BOM that matches its encoding by itself.
    return new TextDecoder(label, { fatal: encoding !== 'latin1' }).decode(bytes);
  } catch {
    if (encoding === 'utf-8') throw invalidUtf8(fileName, bytes);
    throw new ImportError('ENCODING', fileName, `the bytes are not valid ${encoding} text; choose another encoding or re-export the file`);
  }
}

/**
 * A forced encoding other than the UTF-16 the bytes show (a byte-order mark, or a zero in every
 * other byte) would read every character wrong: refused with the likely encoding.
 */
function refuseOtherUtf16(fileName: string, bytes: Uint8Array, forced: TextEncoding, bom: TextEncoding | null): void {
  const utf16 = bom === 'utf-16le' || bom === 'utf-16be' ? bom : guessUtf16WithoutBom(bytes);
  if (!utf16 || utf16 === forced) return;
  const why = bom === utf16 ? `it starts with the ${utf16} byte-order mark` : `every ${utf16 === 'utf-16le' ? 'second' : 'first'} byte of each pair is zero, as in ${utf16} text`;
  throw new ImportError('ENCODING', fileName, `the encoding was set to ${forced}, but the bytes look like ${utf16} (${why}); choose ${utf16}, or leave the encoding to be detected`);
}

/** The first byte that breaks UTF-8 (RFC 3629 sect. 4, lead and continuation bytes), located by line and character. */
function invalidUtf8(fileName: string, b: Uint8Array): ImportError {
  const at = firstInvalidUtf8(b);
  if (at < 0) return new ImportError('ENCODING', fileName, 'the bytes are not valid utf-8 text; choose another encoding (latin1?) or re-export the file');
  const lineStart = b.subarray(0, at).lastIndexOf(0x0a) + 1;
  let line = 1;
  for (let i = b.indexOf(0x0a); i >= 0 && i < lineStart; i = b.indexOf(0x0a, i + 1)) line++;
  const character = new TextDecoder('utf-8').decode(b.subarray(lineStart, at)).length + 1;
  const hex = (b[at] as number).toString(16).toUpperCase().padStart(2, '0');
  return new ImportError('ENCODING', fileName, `the byte 0x${hex} at line ${line}, character ${character} is not valid utf-8; the file is probably Latin-1 (Windows-1252): choose latin1, or leave the encoding to be detected`, { line });
}

function firstInvalidUtf8(b: Uint8Array): number {
  for (let i = 0; i < b.length; ) {
    const c = b[i] as number;
    if (c < 0x80) {
      i++;
      continue;
    }
    const more = c >= 0xc2 && c <= 0xdf ? 1 : c >= 0xe0 && c <= 0xef ? 2 : c >= 0xf0 && c <= 0xf4 ? 3 : -1;
    if (more < 0) return i;
    for (let k = 1; k <= more; k++) if (((b[i + k] ?? 0) & 0xc0) !== 0x80) return i;
    i += more + 1;
  }
  return -1;
}

/**
 * Checks decoded text: strips a leading U+FEFF, rejects text full of control characters (binary
 * data read as text), and rejects text that is empty or only whitespace.
 */
export function checkText(fileName: string, text: string): string {
  const t = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (t.length === 0) throw new ImportError('EMPTY', fileName, 'the file is empty');
  const head = t.length > 65536 ? t.slice(0, 65536) : t;
  let control = 0;
  // Counted only when there is one (a search by the regular-expression engine first).
  if (CONTROL_CHARACTER.test(head)) for (let i = 0; i < head.length; i++) {
    const c = head.charCodeAt(i);
    if ((c < 32 && c !== 9 && c !== 10 && c !== 13 && c !== 12) || c === 0xfffd) control++;
  }
  if (control > Math.max(2, head.length * 0.01)) {
    throw new ImportError('BINARY', fileName, `the file holds binary data (${control} control characters in the first ${head.length} characters), not text; ${ADVICE}`);
  }
  if (/^\s*$/.test(head) && /^\s*$/.test(t)) throw new ImportError('EMPTY', fileName, 'the file holds only blank lines');
  return t;
}

/** Signature check for text that arrived as a string (e.g. from File.text()). */
export function rejectKnownBinaryText(fileName: string, text: string): void {
  const head: number[] = [];
  for (let i = 0; i < Math.min(16, text.length); i++) head.push(text.charCodeAt(i) & 0xff);
  rejectKnownBinary(fileName, head);
}
