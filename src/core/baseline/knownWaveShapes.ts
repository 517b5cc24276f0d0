/**
 * Known wave shapes, each placed by its peak: a reversible wave of a dissolved couple and a
 * Nernstian adsorbed layer, told apart by |Ep − Ep/2| and by whether the tail stays up.
 */
import { reversiblePeakXi, reversibleWaveShape } from './reversibleWaveShape';

/** |Ep − Ep/2| of a reversible wave in units of RT/nF (its source is given with SHAPES below). */
const REVERSIBLE_HALF_WIDTH = 2.2;
/** How far a measured |Ep − Ep/2| may stray from a known wave shape's for that shape to be used (our margin). */
const SHAPE_WIDTH_TOLERANCE = 0.1;

/**
 * The wave shapes known by their |Ep − Ep/2| in units of RT/nF, for a wave's foot under its own
 * pre-peak line (lineUnderOwnFoot.ts) and its tail under a later wave (extendedDecayBaselines.ts): a
 * reversible wave of a dissolved couple, 2.20 (Bard & Faulkner 2nd ed. (2001) eq. 6.2.21), and a
 * Nernstian adsorbed layer, 1.763, half its 90.6/n mV width at half height (Laviron, J.
 * Electroanal. Chem. 52 (1974) 355; Bard & Faulkner eq. 14.3.9: i ∝ e^ξ/(1 + e^ξ)², ξ = nF(E − E°′)/RT).
 */
const SHAPES = [
  {
    halfWidth: REVERSIBLE_HALF_WIDTH,
    diffusing: true,
    words: "the reversible wave's own shape (Nicholson & Shain 1964)",
    // Peak at ξ = −1.109 past E½; after the switch, Cottrell's 1/√t′ with t′ counted from E½ (σt′ = −ξ).
    at: (xiFromPeak: number) => reversibleWaveShape(xiFromPeak + reversiblePeakXi()),
    afterSwitch: (xiFromPeakAtVertex: number, later: number) => {
      const xi = xiFromPeakAtVertex + reversiblePeakXi();
      return -xi < 3 ? null : reversibleWaveShape(xi) * Math.sqrt(-xi / (-xi + later));
    },
  },
  {
    halfWidth: 1.763,
    diffusing: false,
    words: "a Nernstian adsorbed layer's shape, 4e^ξ/(1 + e^ξ)² (Laviron 1974)",
    at: (xi: number) => 4 * Math.exp(xi) / (1 + Math.exp(xi)) ** 2,
    // A converted layer carries no current while the potential stays past it.
    afterSwitch: () => 0,
  },
] as const;

export type WaveShape = (typeof SHAPES)[number];

/** The known shape whose |Ep − Ep/2| (in units of RT/nF) a wave's matches within SHAPE_WIDTH_TOLERANCE. */
export function waveShapeFor(halfWidth: number): WaveShape | undefined {
  return SHAPES.find((x) => Math.abs(halfWidth / x.halfWidth - 1) <= SHAPE_WIDTH_TOLERANCE);
}
