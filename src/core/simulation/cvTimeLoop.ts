/**
 * The time loop of the simulator: per output point, `substeps` fully implicit steps; per step the
 * faradaic model is prepared, the interfacial potential is solved under R_u and C_dl
 * (ohmicDropCoupling.ts), and the step is committed. Shared by simulateCv and simulateCvCouples.
 * Out: total, faradaic and charging current (A, anodic positive) and the interfacial potential (V)
 *   per output point; point 0 carries the first step's currents (see simulateCv.ts).
 */
import type { FaradaicModel } from './faradaicModel';
import { chargingCurrentA, InterfacialPotentialSolver, type ChargingHistory } from './ohmicDropCoupling';

export interface TimeLoopColumns {
  currentA: Float64Array;
  interfacialPotentialV: Float64Array;
  faradaicCurrentA: Float64Array;
  chargingCurrentA: Float64Array;
}

export interface TimeLoopSettings {
  substeps: number;
  dtS: number;
  /** Double-layer capacitance of the whole electrode, F. */
  capacitanceF: number;
  uncompensatedOhm: number;
}

export function runTimeLoop(model: FaradaicModel, appliedV: Float64Array, s: TimeLoopSettings): TimeLoopColumns {
  const total = appliedV.length;
  const out: TimeLoopColumns = {
    currentA: new Float64Array(total),
    interfacialPotentialV: new Float64Array(total),
    faradaicCurrentA: new Float64Array(total),
    chargingCurrentA: new Float64Array(total),
  };
  const { substeps, dtS, capacitanceF } = s;
  const solver = new InterfacialPotentialSolver(model, s.uncompensatedOhm, capacitanceF);
  const history: ChargingHistory = { sigmaPerS: 1 / dtS, historyVPerS: 0 };
  let eNow = appliedV[0] as number;
  let ePrev = eNow;
  let step = 0;
  let iF = 0;
  let iC = 0;
  for (let k = 1; k < total; k++) {
    const e0 = appliedV[k - 1] as number;
    const de = ((appliedV[k] as number) - e0) / substeps;
    for (let j = 1; j <= substeps; j++, step++) {
      history.sigmaPerS = step === 0 ? 1 / dtS : 1.5 / dtS;
      history.historyVPerS = step === 0 ? eNow / dtS : (2 * eNow - 0.5 * ePrev) / dtS;
      model.prepareStep();
      // Linear extrapolation of the last two interfacial potentials seeds the root bracket.
      const eInt = solver.solve(e0 + j * de, history, 2 * eNow - ePrev);
      iF = model.currentAt(eInt);
      iC = chargingCurrentA(capacitanceF, history, eInt);
      model.finishStep(eInt);
      ePrev = eNow;
      eNow = eInt;
      // Point 0 reuses the first step's currents at its own applied potential (see simulateCv.ts).
      if (step === 0) writePoint(out, 0, (appliedV[0] as number) - (iF + iC) * s.uncompensatedOhm, iF, iC);
    }
    writePoint(out, k, eNow, iF, iC);
  }
  return out;
}

function writePoint(out: TimeLoopColumns, k: number, eInt: number, iF: number, iC: number): void {
  out.currentA[k] = iF + iC;
  out.interfacialPotentialV[k] = eInt;
  out.faradaicCurrentA[k] = iF;
  out.chargingCurrentA[k] = iC;
}
