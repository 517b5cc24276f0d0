/** Session text: round trip, the envelope checks, and base64 (RFC 4648 §10 test vectors). */
import { describe, expect, it } from 'vitest';
import { decodeBase64, encodeBase64, parseSession, serializeSession, SessionError, type SessionDocument } from './session';

const doc: SessionDocument = {
  format: 'halfwave-session',
  version: 1,
  savedAt: '2026-12-01T21:00:00.000Z',
  settings: { electronCount: 1, smoothing: { window: 7, order: 2 } },
  view: { convention: 'polarographic' },
  workbench: {},
  files: [
    {
      fileName: 'ferrocene-0.1Vs.csv',
      sha256: 'a'.repeat(64),
      sizeBytes: 1234,
      group: 'series 1',
      overrides: { delimiter: ';', potentialUnit: 'mV' },
      analysis: { peakWindows: [{ direction: 'anodic', fromV: 0.3, toV: 0.6 }] },
    },
  ],
};

/** 'parsed', or the code of the SessionError the text is refused with (any other error fails the test). */
function codeOf(text: string): string {
  try {
    parseSession(text);
    return 'parsed';
  } catch (err) {
    expect(err).toBeInstanceOf(SessionError);
    return (err as SessionError).code;
  }
}

describe('session text', () => {
  it('round-trips a document unchanged', () => {
    expect(parseSession(serializeSession(doc))).toEqual(doc);
  });

  it('names the problem when the text is not a session', () => {
    expect(codeOf('E/V,I/A\n0,1\n')).toBe('NOT_JSON');
    expect(codeOf('{"format":"other"}')).toBe('NOT_A_SESSION');
    expect(codeOf('{"format":"halfwave-session","version":99,"files":[]}')).toBe('NEWER_VERSION');
    expect(codeOf('{"format":"halfwave-session","version":1,"files":[{"fileName":""}]}')).toBe('BAD_FIELD');
    expect(codeOf('{"format":"halfwave-session","version":1,"files":[{"fileName":"a.csv","sha256":"xyz"}]}')).toBe('BAD_FIELD');
  });

  // Hostile input (common practice for parsers of untrusted JSON, no source): refused whole, with the reason.
  it('refuses prototype keys anywhere, cut-short text, wrong override values and enormous text', () => {
    expect(codeOf('{"format":"halfwave-session","version":2,"files":[],"settings":{"__proto__":{"polluted":1}}}')).toBe('UNSAFE_KEY');
    expect(codeOf('{"format":"halfwave-session","version":2,"files":[{"fileName":"a","sha256":null,"analysis":{"constructor":{"prototype":{}}}}]}')).toBe('UNSAFE_KEY');
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    const full = serializeSession(doc);
    expect(codeOf(full.slice(0, full.length / 2))).toBe('NOT_JSON');
    expect(() => parseSession(full.slice(0, full.length / 2))).toThrow(/ends too early|not valid JSON/);
    expect(codeOf('{"format":"halfwave-session","version":2,"files":[{"fileName":"a","sha256":null,"overrides":{"delimiter":"|"}}]}')).toBe('BAD_FIELD');
    expect(codeOf('{"format":"halfwave-session","version":2,"files":[{"fileName":"a","sha256":null,"overrides":{"potentialColumn":1.5}}]}')).toBe('BAD_FIELD');
    expect(codeOf('{"format":"halfwave-session","version":2,"files":[],"view":[]}')).toBe('BAD_FIELD');
    expect(codeOf(' '.repeat(256 * 1024 * 1024 + 1))).toBe('TOO_LARGE');
    const deep = `{"format":"halfwave-session","version":2,"files":[],"settings":{"x":${'['.repeat(50_000)}${']'.repeat(50_000)}}}`;
    expect(['parsed', 'NOT_JSON']).toContain(codeOf(deep));
  });

  it('fills defaults for missing optional fields', () => {
    const parsed = parseSession('{"format":"halfwave-session","version":1,"files":[{"fileName":"a.csv","sha256":null}]}');
    expect(parsed.files[0]).toEqual({ fileName: 'a.csv', sha256: null, sizeBytes: 0, group: 'series 1', overrides: {}, analysis: {} });
    expect(parsed.workbench).toEqual({});
    expect(parsed.settings).toEqual({});
  });
});

// S. Josefsson, "The Base16, Base32, and Base64 Data Encodings", RFC 4648 (2006), §10 test vectors.
describe('base64', () => {
  const vectors: [string, string][] = [['', ''], ['f', 'Zg=='], ['fo', 'Zm8='], ['foo', 'Zm9v'], ['foob', 'Zm9vYg=='], ['fooba', 'Zm9vYmE='], ['foobar', 'Zm9vYmFy']];
  it.each(vectors)('encodes %j as %j and back', (plain, encoded) => {
    const bytes = new TextEncoder().encode(plain);
    expect(encodeBase64(bytes)).toBe(encoded);
    expect(new TextDecoder().decode(decodeBase64(encoded))).toBe(plain);
  });
  it('round-trips 100 000 bytes of every value', () => {
    const bytes = Uint8Array.from({ length: 100_000 }, (_, i) => (i * 7) % 256);
    expect(decodeBase64(encodeBase64(bytes))).toEqual(bytes);
  });
});
