/**
 * A short digest of a long text, to tell two texts apart without sending either: 16 hex digits
 * from two 32-bit lanes over the UTF-16 code units (each a multiply–xor walk with its own odd
 * multiplier), finished by MurmurHash3's 32-bit finaliser (A. Appleby, MurmurHash3, 2011, public
 * domain: fmix32), each lane mixed into the other, then the text's length. Not a cryptographic
 * hash: it is for texts our own code builds, where two different ones would have to agree on all
 * 64 bits by chance.
 */
export function textDigest(text: string): string {
  let a = 0x9e3779b9;
  let b = 0x7f4a7c15;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    a = Math.imul(a ^ c, 0x01000193);
    b = Math.imul(b ^ c, 0x5bd1e995);
  }
  a = fmix32(a ^ text.length);
  b = fmix32(b ^ Math.imul(a, 0x85ebca6b));
  a = fmix32(a ^ b);
  return `${hex32(a)}${hex32(b)}:${text.length}`;
}

/** MurmurHash3's 32-bit finaliser (fmix32): every input bit reaches every output bit. */
function fmix32(h: number): number {
  let x = h;
  x ^= x >>> 16;
  x = Math.imul(x, 0x85ebca6b);
  x ^= x >>> 13;
  x = Math.imul(x, 0xc2b2ae35);
  x ^= x >>> 16;
  return x;
}

function hex32(x: number): string {
  return (x >>> 0).toString(16).padStart(8, '0');
}
