/**
 * Seeded randomness for the fuzz suite: every input is rebuilt from (family, index) alone, so a
 * failure report names an input that anyone can regenerate. Uniforms: mulberry32 (public-domain
 * generator by T. Ettinger, from memory), seeded by an FNV-1a hash of the family name and index
 * (Fowler, Noll, Vo; IETF draft "The FNV Non-Cryptographic Hash Algorithm").
 */
export class Rng {
  private state: number;

  constructor(family: string, index: number) {
    let h = 0x811c9dc5;
    for (const ch of `${family}#${index}`) h = Math.imul(h ^ ch.charCodeAt(0), 0x01000193);
    this.state = h >>> 0;
  }

  /** Uniform in [0, 1). */
  next(): number {
    this.state = (this.state + 0x6d2b79f5) >>> 0;
    let t = this.state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  }

  /** Integer in [lo, hi]. */
  int(lo: number, hi: number): number {
    return lo + Math.floor(this.next() * (hi - lo + 1));
  }

  pick<T>(items: readonly T[]): T {
    return items[Math.floor(this.next() * items.length)] as T;
  }

  chance(p: number): boolean {
    return this.next() < p;
  }

  bytes(n: number): Uint8Array {
    const out = new Uint8Array(n);
    for (let i = 0; i < n; i++) out[i] = Math.floor(this.next() * 256);
    return out;
  }
}

export function concatBytes(parts: Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}
