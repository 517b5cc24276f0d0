/**
 * Butler–Volmer boundary condition solved together with the implicit diffusion step.
 * Source: A. J. Bard, L. R. Faulkner, "Electrochemical Methods", 2nd ed., Wiley (2001), §3.3
 *   (current–potential characteristic, from memory): J = k0[c_O(0)e^{−αnfη} − c_R(0)e^{(1−α)nfη}].
 * In: x = nF(E − E°′)/(RT); α; k0 (cm/s, may be Infinity for a Nernstian couple); the linear
 *   relations c_O(0) = uO − J·sO and c_R(0) = uR + J·sR from the diffusion step (mol/cm³ and
 *   cm·s, sO, sR > 0).
 * Out: J, the net rate of reduction per area, mol cm⁻² s⁻¹ (positive = reduction = cathodic).
 * Solving the linear BV relation for J gives J(1/k_f + sO + θ sR) = uO − θ uR with θ = e^x and
 *   1/k_f = e^{αx}/k0; for x > 0 both sides are divided by θ so that nothing overflows.
 */
export function butlerVolmerFlux(x: number, alpha: number, k0CmPerS: number, uO: number, sO: number, uR: number, sR: number): number {
  if (x <= 0) {
    const theta = Math.exp(x);
    const inverseKf = Math.exp(alpha * x) / k0CmPerS;
    return (uO - theta * uR) / (inverseKf + sO + theta * sR);
  }
  const inverseTheta = Math.exp(-x);
  const inverseKb = Math.exp(-(1 - alpha) * x) / k0CmPerS;
  return (uO * inverseTheta - uR) / (inverseKb + sO * inverseTheta + sR);
}
