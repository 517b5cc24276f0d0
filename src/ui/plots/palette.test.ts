/**
 * Plot colours stay apart for the common colour-vision deficiencies. Dichromat simulation:
 * G. M. Machado, M. M. Oliveira, L. A. F. Fernandes, "A physiologically-based model for simulation
 * of color vision deficiency", IEEE TVCG 15 (2009) 1291, severity 1.0 matrices on linear RGB (from
 * memory); colour difference CIE 1976 ΔE*ab (CIE 15:2004) with the sRGB transfer function
 * (IEC 61966-2-1). A ΔE of 20 or more reads as clearly different colours (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { hexToRgb, palette, sequentialColour, VIRIDIS } from './palette';

const MACHADO: Record<string, number[][]> = {
  protanopia: [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]],
  deuteranopia: [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.01182, 0.04294, 0.968881]],
  tritanopia: [[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.3039]],
};

const toLinear = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);

function lab(rgbLinear: number[]): number[] {
  const [r, g, b] = rgbLinear.map((v) => Math.min(1, Math.max(0, v))) as [number, number, number];
  const X = 0.4124 * r + 0.3576 * g + 0.1805 * b;
  const Y = 0.2126 * r + 0.7152 * g + 0.0722 * b;
  const Z = 0.0193 * r + 0.1192 * g + 0.9505 * b;
  const f = (t: number) => (t > 216 / 24389 ? Math.cbrt(t) : (24389 / 27 * t + 16) / 116);
  const [fx, fy, fz] = [f(X / 0.95047), f(Y), f(Z / 1.08883)];
  return [116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)];
}

function seen(hex: string, deficiency: string | null): number[] {
  const lin = hexToRgb(hex).map((c) => toLinear(c / 255));
  const m = deficiency ? MACHADO[deficiency]! : null;
  return lab(m ? m.map((row) => row[0]! * lin[0]! + row[1]! * lin[1]! + row[2]! * lin[2]!) : lin);
}

const deltaE = (a: number[], b: number[]) => Math.hypot(a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!);

describe('plot colours for colour-vision deficiencies', () => {
  for (const d of [null, 'protanopia', 'deuteranopia', 'tritanopia']) {
    it(`anodic and cathodic differ (ΔE ≥ 20) for ${d ?? 'normal vision'}`, () => {
      expect(deltaE(seen(palette.anodic, d), seen(palette.cathodic, d))).toBeGreaterThanOrEqual(20);
    });
    it(`the first four cycle colours differ pairwise (ΔE ≥ 20) for ${d ?? 'normal vision'}`, () => {
      const c = palette.traces.slice(0, 4);
      for (let i = 0; i < c.length; i++) for (let j = i + 1; j < c.length; j++) expect(deltaE(seen(c[i]!, d), seen(c[j]!, d))).toBeGreaterThanOrEqual(20);
    });
  }
  it('the scan-rate scale grows in lightness from slow to fast, so its order reads without hue', () => {
    const l = [0, 0.25, 0.5, 0.75, 1].map((t) => seen(sequentialColour(t), 'deuteranopia')[0]!);
    for (let k = 1; k < l.length; k++) expect(l[k]!).toBeGreaterThan(l[k - 1]!);
    expect(VIRIDIS).toHaveLength(11);
  });
});
