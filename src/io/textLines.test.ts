/**
 * Line endings as a file uses them: LF (U+000A), CRLF (U+000D U+000A) and CR alone, per The
 * Unicode Standard, ch. 5.8 "Newline Guidelines"; what each is called is common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { normaliseLineEnds, splitFields } from './textLines';

describe('normaliseLineEnds', () => {
  it.each([
    ['a\nb\nc', 'LF', 'a\nb\nc'],
    ['a\r\nb\r\nc', 'CRLF', 'a\nb\nc'],
    ['a\rb\rc', 'CR', 'a\nb\nc'],
    ['a\r\nb\nc\rd', 'mixed', 'a\nb\nc\nd'],
    ['a\r\nb\r\n', 'CRLF', 'a\nb\n'],
    ['just one line', 'none', 'just one line'],
  ])('%j ends its lines with %s', (text, kind, normalised) => {
    const out = normaliseLineEnds(text);
    expect(out.lineEnding.value).toBe(kind);
    expect(out.text).toBe(normalised);
  });
});

describe('splitFields', () => {
  it('splits at runs of blanks and unquotes each field (worked by hand)', () => {
    expect(splitFields('  0.1 \t "-2e-6"  3 ', 'whitespace')).toEqual(['0.1', '-2e-6', '3']);
    expect(splitFields('   ', 'whitespace')).toEqual([]);
  });
  it('trims the fields of a delimited line', () => {
    expect(splitFields(' 0,1 ; 2 ;', ';')).toEqual(['0,1', '2', '']);
  });
});
