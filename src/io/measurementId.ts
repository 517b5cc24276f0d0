/**
 * A short stable id for an imported file: FNV-1a 32-bit hash (Fowler, Noll, Vo; IETF draft
 * "The FNV Non-Cryptographic Hash Algorithm") of the name, the length and up to 256 kB of the
 * text, so the same file gets the same id in every session. Not a security hash.
 */
export function measurementId(fileName: string, text: string): string {
  let h = fnv1a(0x811c9dc5, fileName, 1);
  h = fnv1a(h, String(text.length), 1);
  h = fnv1a(h, text, Math.max(1, Math.floor(text.length / 262144)));
  const slug = fileName.replace(/^.*[\\/]/, '').replace(/[^A-Za-z0-9._-]+/g, '_').slice(0, 40);
  return `${(h >>> 0).toString(16).padStart(8, '0')}-${slug}`;
}

/**
 * The hash `h` carried on over every `step`-th character of `s`. A plain function with the hash in
 * a local (not a closure over it): it runs over every character of a page's first files before
 * the engine has optimised it.
 */
export function fnv1a(h: number, s: string, step: number): number {
  let x = h;
  for (let i = 0; i < s.length; i += step) {
    x ^= s.charCodeAt(i);
    x = Math.imul(x, 0x01000193);
  }
  return x;
}
