/**
 * Least-squares polynomial c0 + c1·u + … + c_d·u^d by its normal equations, solved by Gaussian
 * elimination with partial pivoting (N. R. Draper, H. Smith, Applied Regression Analysis, 3rd ed.
 * (Wiley, 1998), ch. 5: b = (XᵀX)⁻¹Xᵀy). For low degrees on an abscissa of order 1 (centre and
 * scale it first); powers are formed by products and nothing but +, −, × and ÷ is used, so every
 * JavaScript engine gives the same bits (the page's and Node's results must agree).
 * In: u, y (same length), degree d ≥ 1, and optionally a weight wᵢ ≥ 0 per point (weighted least
 *   squares: Σ wᵢ·(yᵢ − p(uᵢ))² minimised, b = (XᵀWX)⁻¹XᵀWy; same book, from memory). Out:
 *   [c0 … c_d], or null when the equations are singular (fewer distinct abscissae of positive
 *   weight than coefficients) or a coefficient is not finite.
 */
export function polynomialCoefficients(u: ArrayLike<number>, y: ArrayLike<number>, degree: number, weights?: ArrayLike<number>): number[] | null {
  const p = degree + 1;
  const m = Array.from({ length: p }, () => new Array<number>(p + 1).fill(0));
  const powers = new Array<number>(p);
  for (let i = 0; i < u.length; i++) {
    powers[0] = 1;
    for (let k = 1; k < p; k++) powers[k] = powers[k - 1]! * (u[i] as number);
    const w = weights ? (weights[i] as number) : 1;
    for (let r = 0; r < p; r++) {
      const row = m[r]!;
      const wr = w * powers[r]!;
      for (let c = 0; c < p; c++) row[c]! += wr * powers[c]!;
      row[p]! += wr * (y[i] as number);
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
