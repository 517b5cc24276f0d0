/**
 * The model current of a fit at every fitted point: for each voltammogram one simulation of all
 * couples at one electrode (simulateCvCouples: faradaic currents summed, R_u and C_dl solved once
 * for the sum), interpolated linearly onto the measured points.
 * Numerics: the space grid of each couple in each voltammogram is frozen (fixedGrids) until
 *   freezeGrids is called again, so that the current is a smooth function of D and k_f while
 *   the iteration moves them (an automatic grid changes its node count in steps, and a
 *   finite-difference Jacobian would see those steps). The frozen grid is the automatic one for
 *   D/2 (first spacing) and 2D (outer edge), so it stays at least as accurate while D moves by up
 *   to a factor 2 (about 5 more nodes than the automatic grid at the default spacing ratio 1.15).
 * In: prepared records, the cell, the model settings, parameter values. Out: currents in A
 *   (IUPAC), concatenated over the records in their order.
 */
import { DEFAULT_SIMULATION, automaticGrid, simulateCvCouples, type CoupleInput, type CvSimulationInput, type FixedGrid, type SimulateCvOptions } from '../simulation';
import type { PreparedRecord } from './fitRecords';
import type { CoupleValues, FitCell, FitMechanism, FitModelValues } from './fitTypes';

/** Factor by which D and k_f may move from where the grids were frozen (fitStages.ts freezes again beyond it). */
export const GRID_MARGIN = 2;

export interface ModelSettings {
  mechanism: FitMechanism;
  cell: FitCell;
  /** n per couple. */
  electronCounts: number[];
  initialSpecies: 'O' | 'R';
}

export class FitModel {
  private grids: (FixedGrid | null)[][] = [];
  /** Simulations run so far (one per voltammogram per evaluation). */
  simulations = 0;

  constructor(
    readonly records: readonly PreparedRecord[],
    readonly settings: ModelSettings,
    private numerics: SimulateCvOptions,
  ) {}

  get pointCount(): number {
    const last = this.records[this.records.length - 1] as PreparedRecord;
    return last.offset + last.indices.length;
  }

  /** Sets the numerical options and freezes every couple's grid at `values`. */
  freezeGrids(values: FitModelValues, numerics: SimulateCvOptions = this.numerics): void {
    this.numerics = numerics;
    this.grids = this.records.map((r) => {
      const totalTimeS = (2 * r.cycles * Math.abs(r.switchV - r.startV)) / r.scanRateVPerS;
      return values.couples.map((c, j) => {
        if (this.settings.mechanism === 'surface') return null;
        const full: CvSimulationInput = { ...DEFAULT_SIMULATION, ...this.cellInput(r, values), ...this.coupleInput(c, j) };
        const scaled = (f: number): CvSimulationInput => ({ ...full, diffusionOCm2PerS: full.diffusionOCm2PerS * f, diffusionRCm2PerS: full.diffusionRCm2PerS * f, followUpRatePerS: full.followUpRatePerS / f });
        // Margins: the grid stays at least as fine and as deep as the automatic one while D (and k_f) move by up to GRID_MARGIN.
        return { firstSpacingCm: automaticGrid(scaled(1 / GRID_MARGIN), numerics, totalTimeS).firstSpacingCm, outerEdgeCm: automaticGrid(scaled(GRID_MARGIN), numerics, totalTimeS).outerEdgeCm };
      });
    });
  }

  /** Writes the model current at every fitted point into `out`; `beforeSimulation` runs before each simulation (cancel check). */
  evaluate(values: FitModelValues, out: Float64Array, beforeSimulation?: () => void): void {
    this.records.forEach((r, k) => {
      beforeSimulation?.();
      const sim = this.simulate(values, k);
      const pos = r.position;
      for (let i = 0; i < pos.length; i++) {
        const x = pos[i] as number;
        const a = Math.min(Math.floor(x), sim.length - 2);
        const t = x - a;
        out[r.offset + i] = (1 - t) * (sim[a] as number) + t * (sim[a + 1] as number);
      }
    });
  }

  /** Total current of voltammogram k over its whole simulated waveform, A. */
  simulate(values: FitModelValues, k: number): Float64Array {
    const r = this.records[k] as PreparedRecord;
    this.simulations++;
    const couples = values.couples.map((c, j) => this.coupleInput(c, j));
    const fixedGrids = this.grids[k] ?? [];
    return simulateCvCouples(this.cellInput(r, values), couples, { ...this.numerics, fixedGrids }).currentA;
  }

  private cellInput(r: PreparedRecord, values: FitModelValues): Partial<CvSimulationInput> {
    const { cell } = this.settings;
    return {
      areaCm2: cell.areaCm2, temperatureK: cell.temperatureK, scanRateVPerS: r.scanRateVPerS, startV: r.startV, switchV: r.switchV,
      cycles: r.cycles, stepV: r.stepV, doubleLayerFPerCm2: values.shared.doubleLayerFPerCm2, uncompensatedOhm: values.shared.uncompensatedOhm,
    };
  }

  private coupleInput(c: CoupleValues, j: number): CoupleInput {
    const { mechanism, cell, initialSpecies } = this.settings;
    const bulk = mechanism === 'surface' ? 0 : cell.concentrationMolPerCm3;
    return {
      mechanism, formalPotentialV: c.formalPotentialV, k0CmPerS: c.k0CmPerS, alpha: c.alpha,
      electronCount: this.settings.electronCounts[j] ?? cell.electronCount,
      diffusionOCm2PerS: c.diffusionOCm2PerS, diffusionRCm2PerS: c.diffusionOCm2PerS / c.diffusionRatio,
      concentrationOMolPerCm3: initialSpecies === 'O' ? bulk : 0, concentrationRMolPerCm3: initialSpecies === 'R' ? bulk : 0,
      followUpRatePerS: c.followUpRatePerS, coverageMolPerCm2: c.coverageMolPerCm2, surfaceRatePerS: c.surfaceRatePerS,
    };
  }
}
