import { describe, expect, it } from 'vitest';
import { sha256Hex } from './sha256';

const utf8 = (s: string) => new TextEncoder().encode(s);

describe('sha256Hex', () => {
  // NIST FIPS 180-4 examples (NIST "SHA256.pdf" example values, from memory): "abc", the empty
  // message, and the 448-bit two-block message.
  it('matches the published test vectors', () => {
    expect(sha256Hex(utf8('abc'))).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    expect(sha256Hex(new Uint8Array(0))).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
    expect(sha256Hex(utf8('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq'))).toBe('248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1');
  });
  // Same source: the 896-bit message and one million 'a' (FIPS 180-2 appendix B, from memory).
  it('matches the longer published vectors', () => {
    const m = 'abcdefghbcdefghicdefghijdefghijkefghijklfghijklmghijklmnhijklmnoijklmnopjklmnopqklmnopqrlmnopqrsmnopqrstnopqrstu';
    expect(sha256Hex(utf8(m))).toBe('cf5b16a778af8380036ce59e7b0492370b249b11e8f07a51afac45037afee9d1');
    expect(sha256Hex(new Uint8Array(1_000_000).fill(0x61))).toBe('cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0');
  });
});
