/**
 * A short stable id for an imported file: FNV-1a 32-bit hash (Fowler, Noll, Vo; IETF draft
 * "The FNV Non-Cryptographic Hash Algorithm") of the name, the length and up to 256 kB of the
 * text, so the same file gets the same id in every session. Not a security hash.
 */
export function measurementId(fileName: string, text: string): string {
  let h = 0x811c9dc5;
  const feed = (s: string, step: number) => {
    for (let i = 0; i < s.length; i += step) {
      h ^= s.charCodeAt(i);
      h = Math.imul(h, 0x01000193);
    }
  };
  feed(fileName, 1);
  feed(String(text.length), 1);
  feed(text, Math.max(1, Math.floor(text.length / 262144)));
  const slug = fileName.replace(/^.*[\\/]/, '').replace(/[^A-Za-z0-9._-]+/g, '_').slice(0, 40);
  return `${(h >>> 0).toString(16).padStart(8, '0')}-${slug}`;
}
