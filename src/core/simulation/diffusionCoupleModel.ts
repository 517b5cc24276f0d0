/**
 * E and EC mechanisms in solution: O + n e⁻ ⇌ R at a planar electrode with Butler–Volmer
 * kinetics, both species diffusing (semi-infinite), and for EC a first-order decay of one of
 * them (R → Z after a reduction, or O → Z after an oxidation) into an electro-inactive product.
 * Source: EC scheme as in R. S. Nicholson, I. Shain, "Theory of stationary electrode
 *   polarography. Single scan and cyclic methods applied to reversible, irreversible, and
 *   kinetic systems", Anal. Chem. 36, 706 (1964) (case of a following chemical reaction, from
 *   memory); numerics in bdf2DiffusionSpecies.ts and butlerVolmerFlux.ts.
 * Current: i_F = −nFA·J (IUPAC: reduction gives negative current).
 */
import { FARADAY_C_PER_MOL, inverseThermalVoltagePerV } from '../constants';
import { Bdf2DiffusionSpecies } from './bdf2DiffusionSpecies';
import { butlerVolmerFlux } from './butlerVolmerFlux';
import type { ExpandingGrid } from './expandingGrid';
import type { FaradaicModel } from './faradaicModel';
import type { CvSimulationInput } from './simulationTypes';
import type { StepRule } from './vertexStepSchedule';

export class DiffusionCoupleModel implements FaradaicModel {
  private readonly oxidised: Bdf2DiffusionSpecies;
  private readonly reduced: Bdf2DiffusionSpecies;
  private readonly nf: number;
  private readonly chargePerMol: number;

  constructor(
    private readonly input: CvSimulationInput,
    grid: ExpandingGrid,
    decaying: 'O' | 'R' | 'none',
  ) {
    const kO = decaying === 'O' ? input.followUpRatePerS : 0;
    const kR = decaying === 'R' ? input.followUpRatePerS : 0;
    this.oxidised = new Bdf2DiffusionSpecies(grid, input.diffusionOCm2PerS, input.concentrationOMolPerCm3, kO);
    this.reduced = new Bdf2DiffusionSpecies(grid, input.diffusionRCm2PerS, input.concentrationRMolPerCm3, kR);
    this.nf = input.electronCount * inverseThermalVoltagePerV(input.temperatureK);
    this.chargePerMol = input.electronCount * FARADAY_C_PER_MOL * input.areaCm2;
  }

  prepareStep(rule: StepRule): void {
    this.oxidised.prepareStep(rule);
    this.reduced.prepareStep(rule);
  }

  /** Net reduction rate J (mol cm⁻² s⁻¹) for this step at the given interfacial potential. */
  private fluxAt(interfacialV: number): number {
    const o = this.oxidised;
    const r = this.reduced;
    const x = this.nf * (interfacialV - this.input.formalPotentialV);
    return butlerVolmerFlux(x, this.input.alpha, this.input.k0CmPerS, o.intercept, o.slope, r.intercept, r.slope);
  }

  currentAt(interfacialV: number): number {
    return -this.chargePerMol * this.fluxAt(interfacialV);
  }

  finishStep(interfacialV: number): void {
    const j = this.fluxAt(interfacialV);
    this.oxidised.finishStep(j);
    this.reduced.finishStep(-j);
  }

  /** Surface concentrations after the last step, mol/cm³ (for diagnostics and tests). */
  surfaceConcentrations(): { oxidisedMolPerCm3: number; reducedMolPerCm3: number } {
    return { oxidisedMolPerCm3: this.oxidised.latestMolPerCm3[0] as number, reducedMolPerCm3: this.reduced.latestMolPerCm3[0] as number };
  }
}
