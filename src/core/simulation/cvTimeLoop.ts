/**
 * The time loop of the simulator: per output point, `substeps` fully implicit steps (shorter ones
 * after each vertex, vertexStepSchedule.ts); per step the faradaic
 * model is prepared, the interfacial potential is solved under R_u and C_dl
 * (ohmicDropCoupling.ts), and the step is committed. Shared by simulateCv and simulateCvCouples.
 * Out: total, faradaic and charging current (A, anodic positive) and the interfacial potential (V)
 *   per output point; point 0 carries the first step's currents (see simulateCv.ts).
 */
import type { FaradaicModel } from './faradaicModel';
import { chargingCurrentA, InterfacialPotentialSolver, type ChargingHistory } from './ohmicDropCoupling';
import type { StepRule, StepSchedule } from './vertexStepSchedule';

export interface TimeLoopColumns {
  currentA: Float64Array;
  interfacialPotentialV: Float64Array;
  faradaicCurrentA: Float64Array;
  chargingCurrentA: Float64Array;
}

export interface TimeLoopSettings {
  substeps: number;
  /** Time steps and their coefficients (vertexStepSchedule.ts); `schedule.dtS` is the base step. */
  schedule: StepSchedule;
  /** Output intervals per sweep: a vertex falls at every multiple of it. */
  vertexEvery: number;
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
  const { substeps, capacitanceF, schedule } = s;
  const solver = new InterfacialPotentialSolver(model, s.uncompensatedOhm, capacitanceF);
  const history: ChargingHistory = { sigmaPerS: 0, historyVPerS: 0 };
  let eNow = appliedV[0] as number;
  let ePrev = eNow;
  let eOlder = eNow;
  let lastDtS = schedule.dtS;
  let first = true;
  let iF = 0;
  let iC = 0;
  const step = (rule: StepRule, appliedNow: number): void => {
    history.sigmaPerS = rule.sigmaPerS;
    history.historyVPerS = rule.latestWeightPerS * eNow + rule.previousWeightPerS * ePrev + rule.olderWeightPerS * eOlder;
    model.prepareStep(rule);
    // Linear extrapolation of the last two interfacial potentials seeds the root bracket.
    const eInt = solver.solve(appliedNow, history, eNow + (rule.dtS / lastDtS) * (eNow - ePrev));
    iF = model.currentAt(eInt);
    iC = chargingCurrentA(capacitanceF, history, eInt);
    model.finishStep(eInt);
    eOlder = ePrev;
    ePrev = eNow;
    eNow = eInt;
    lastDtS = rule.dtS;
    // Point 0 reuses the first step's currents at its own applied potential (see simulateCv.ts).
    if (first) writePoint(out, 0, (appliedV[0] as number) - (iF + iC) * s.uncompensatedOhm, iF, iC);
    first = false;
  };
  const unitsPerInterval = substeps * 2 ** schedule.halvings;
  const shortestS = schedule.dtS / 2 ** schedule.halvings;
  // Steps in units of the shortest step: a step of level j is 2^j units (the base step is level `halvings`).
  let level = schedule.halvings;
  let sinceVertex = 0;
  let restart = false;
  // Steps of the base length in a row: from the third on, the last three values are Δt apart (BDF3).
  let baseSteps = 0;
  for (let k = 1; k < total; k++) {
    const e0 = appliedV[k - 1] as number;
    const slope = ((appliedV[k] as number) - e0) / (unitsPerInterval * shortestS);
    if ((k - 1) % s.vertexEvery === 0) {
      // A vertex: start afresh with the shortest step (vertexStepSchedule.ts).
      restart = true;
      level = 0;
      sinceVertex = 0;
    }
    for (let done = 0; done < unitsPerInterval;) {
      let rule = restart ? schedule.restart : level === schedule.halvings && baseSteps >= 2 ? schedule.third : (schedule.equal[level] as StepRule);
      if (!restart && level < schedule.halvings && sinceVertex % (2 << level) === 0
        && ((2 << level) * shortestS <= schedule.fineStepS || sinceVertex * shortestS >= schedule.fineWindowS)) {
        level++;
        rule = schedule.doubled[level] as StepRule;
      }
      baseSteps = restart || level < schedule.halvings ? 0 : baseSteps + 1;
      restart = false;
      done += 1 << level;
      if (level < schedule.halvings) sinceVertex += 1 << level;
      step(rule, done === unitsPerInterval ? (appliedV[k] as number) : e0 + slope * done * shortestS);
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
