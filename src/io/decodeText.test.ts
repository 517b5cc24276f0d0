import { describe, expect, it } from 'vitest';
import { encodeLatin1, encodeUtf16, encodeUtf8 } from '../../test/fixtures/layoutWriter';
import { checkText, decodeBytes } from './decodeText';
import { ImportError } from './errors';

// BOMs: The Unicode Standard, ch. 23.8 (U+FEFF as EF BB BF, FF FE, FE FF); Latin-1 0xB5 = µ
// (ISO/IEC 8859-1).
describe('decodeBytes', () => {
  const text = 'E (V);I (µA)\n0,1;2,5\n';
  it('UTF-8 with and without BOM, UTF-16 LE/BE with BOM, Latin-1 all give the same text', () => {
    expect(decodeBytes('a', encodeUtf8(text)).text).toBe(text);
    expect(decodeBytes('a', encodeUtf8(text, true)).text).toBe(text);
    expect(decodeBytes('a', encodeUtf16(text, true)).text).toBe(text);
    expect(decodeBytes('a', encodeUtf16(text, false)).text).toBe(text);
    const latin = decodeBytes('a', encodeLatin1(text));
    expect(latin.text).toBe(text);
    expect(latin.encoding.value).toBe('latin1');
  });

  it('UTF-16 LE without a BOM is recognised by its zero bytes', () => {
    const bytes = encodeUtf16(text, true).subarray(2);
    const d = decodeBytes('a', bytes);
    expect(d.encoding.value).toBe('utf-16le');
    expect(d.text).toBe(text);
  });

  it('a forced encoding is used and marked as overridden', () => {
    const d = decodeBytes('a', encodeLatin1(text), 'latin1');
    expect(d.encoding).toMatchObject({ value: 'latin1', overridden: true });
  });

  it('control characters in decoded text are binary data', () => {
    expect(() => checkText('f.txt', '\u0001\u0002\u0003\u0004 some text')).toThrow(ImportError);
    expect(checkText('f.txt', '\ufeffE;I')).toBe('E;I');
  });
});
