/**
 * Least-squares polynomial c0 + c1·u + … + c_d·u^d by its normal equations, solved by Gaussian
 * elimination with partial pivoting (N. R. Draper, H. Smith, Applied Regression Analysis, 3rd ed.
 * (Wiley, 1998), ch. 5: b = (XᵀX)⁻¹Xᵀy). For low degrees on an abscissa of order 1 (centre and
 * scale it first); powers are formed by products and nothing but +, −, × and ÷ is used, so every
 * JavaScript engine gives the same bits (the page's and Node's results must agree).
 * In: u, y (same length), degree d ≥ 1. Out: [c0 … c_d], or null when the equations are singular
 *   (fewer distinct abscissae than coefficients) or a coefficient is not finite.
 */
export function polynomialCoefficients(u: ArrayLike<number>, y: ArrayLike<number>, degree: number): number[] | null {
  const p = degree + 1;
  const m = Array.from({ length: p }, () => new Array<number>(p + 1).fill(0));
  const powers = new Array<number>(p);
  for (let i = 0; i < u.length; i++) {
    powers[0] = 1;
    for (let k = 1; k < p; k++) powers[k] = powers[k - 1]! * (u[i] as number);
    for (let r = 0; r < p; r++) {
      const row = m[r]!;
      for (let c = 0; c < p; c++) row[c]! += powers[r]! * powers[c]!;
      row[p]! += powers[r]! * (y[i] as number);
    }
  }
  for (let c = 0; c < p; c++) {
    let best = c;
    for (let r = c + 1; r < p; r++) if (Math.abs(m[r]![c]!) > Math.abs(m[best]![c]!)) best = r;
    if (!(Math.abs(m[best]![c]!) > 1e-12 * Math.abs(m[0]![0]!))) return null;
    [m[c], m[best]] = [m[best]!, m[c]!];
    for (let r = c + 1; r < p; r++) {
      const f = m[r]![c]! / m[c]![c]!;
      for (let k = c; k <= p; k++) m[r]![k]! -= f * m[c]![k]!;
    }
  }
  const out = new Array<number>(p).fill(0);
  for (let r = p - 1; r >= 0; r--) {
    let v = m[r]![p]!;
    for (let k = r + 1; k < p; k++) v -= m[r]![k]! * out[k]!;
    out[r] = v / m[r]![r]!;
  }
  return out.every(Number.isFinite) ? out : null;
}
