/**
 * Levenberg–Marquardt minimisation of S(u) = ‖r(u)‖² within box limits, for a residual
 * function that costs one or more full simulations per call.
 * Sources: K. Levenberg, Q. Appl. Math. 2 (1944) 164; D. W. Marquardt, "An algorithm for
 *   least-squares estimation of nonlinear parameters", J. SIAM 11 (1963) 431 (damping scaled by
 *   diag(JᵀJ)); damping update of H. B. Nielsen, "Damping parameter in Marquardt's method",
 *   IMM-REP-1999-05, DTU (1999), as in K. Madsen, H. B. Nielsen, O. Tingleff, "Methods for
 *   non-linear least squares problems", 2nd ed., DTU (2004), algorithm 3.16; box limits by
 *   projection with an active set (a parameter at a limit whose step points outward is held
 *   there for that step), in the manner of C. Kanzow, N. Yamashita, M. Fukushima, J. Comput.
 *   Appl. Math. 172 (2004) 375; convergence by the relative offset of D. M. Bates, D. G. Watts,
 *   Nonlinear Regression Analysis and Its Applications, Wiley (1988), §2.2.3:
 *   √(gᵀA⁻¹g/p) / √(S/(m−p)) < 0.001, over the parameters not held at a limit (all from memory).
 * In: the problem (counts, r(u) writer, forward-difference steps, limits), a start u0.
 * Out: the best u, its residuals and S, iterations, evaluations, whether and why it stopped.
 * Differences from the sources: forward-difference Jacobian (one evaluation per parameter, a
 *   backward step at an upper limit); a residual call that throws AnalysisError counts as a
 *   failed step; `signal.aborted` is checked before every evaluation and stops with CANCELLED.
 */
import { AnalysisError } from '../errors';
import { normalEquations, solveDamped, type Columns } from './leastSquaresAlgebra';
import { Evaluator } from './residualEvaluator';

export interface LeastSquaresProblem {
  parameterCount: number;
  residualCount: number;
  /** Writes r(u) into `out`; may throw AnalysisError for a parameter set the model refuses. */
  residuals(u: Float64Array, out: Float64Array): void;
  /** Forward-difference step per parameter, in u units. */
  stepSizes: Float64Array;
  /** Box limits of u (±Infinity where there is none). */
  lower: Float64Array;
  upper: Float64Array;
}

export interface FitProgress {
  iteration: number;
  /** Sum of squared residuals, A². */
  costA2: number;
  evaluations: number;
  /** Bates–Watts relative offset (converged below the tolerance). */
  relativeOffset: number;
}

export interface LevenbergMarquardtOptions {
  /** @default 60 */
  maxIterations?: number;
  /** Bates–Watts relative offset at which the fit counts as converged. @default 0.001 */
  relativeOffsetTolerance?: number;
  /** Largest |Δu| that still counts as a step. @default 1e-7 */
  stepTolerance?: number;
  /** Initial damping λ (relative to diag(JᵀJ)). @default 1e-3 */
  initialDamping?: number;
  onProgress?: (p: FitProgress) => void;
  /** Checked after every accepted step; true stops the iteration (reason 'interrupted'). */
  interrupt?: ((u: Float64Array) => boolean) | undefined;
  /** Checked before every evaluation; when true the fit stops with AnalysisError('CANCELLED'). */
  signal?: { readonly aborted: boolean } | undefined;
}

export type StopReason = 'relative-offset' | 'step' | 'max-iterations' | 'no-descent' | 'interrupted';

export interface LevenbergMarquardtResult {
  u: Float64Array;
  residuals: Float64Array;
  costA2: number;
  iterations: number;
  evaluations: number;
  converged: boolean;
  reason: StopReason;
  relativeOffset: number;
}

export function levenbergMarquardt(problem: LeastSquaresProblem, u0: Float64Array, options: LevenbergMarquardtOptions = {}): LevenbergMarquardtResult {
  const { parameterCount: p, residualCount: m } = problem;
  if (u0.length !== p) throw new AnalysisError('LENGTH_MISMATCH', `u0 has ${u0.length} entries, the problem ${p} parameters`);
  if (!(m > p)) throw new AnalysisError('TOO_FEW_POINTS', `${m} residuals cannot determine ${p} parameters`);
  return new MarquardtIteration(problem, u0, options).run();
}

/** State of one minimisation; each method is one phase of an iteration. */
class MarquardtIteration {
  private readonly ev: Evaluator;
  private u: Float64Array;
  private r: Float64Array;
  private trial: Float64Array;
  private cost: number;
  private readonly jac: Columns;
  private system = { a: [[0]], g: [0] };
  private lambda: number;
  private nu = 2;
  private offset = Infinity;
  private iteration = 0;

  constructor(private readonly problem: LeastSquaresProblem, u0: Float64Array, private readonly o: LevenbergMarquardtOptions) {
    const m = problem.residualCount;
    this.ev = new Evaluator(problem, o.signal);
    this.u = u0.map((x, i) => Math.min(Math.max(x, problem.lower[i] as number), problem.upper[i] as number));
    this.r = new Float64Array(m);
    this.trial = new Float64Array(m);
    this.jac = Array.from({ length: problem.parameterCount }, () => new Float64Array(m));
    this.lambda = o.initialDamping ?? 1e-3;
    this.cost = this.ev.run(this.u, this.r);
    if (!Number.isFinite(this.cost)) throw new AnalysisError('NOT_CONVERGED', 'the model cannot be evaluated at the starting values');
  }

  run(): LevenbergMarquardtResult {
    const maxIterations = this.o.maxIterations ?? 60;
    const tolerance = this.o.relativeOffsetTolerance ?? 0.001;
    let reason: StopReason = 'max-iterations';
    let fresh = false;
    while (this.iteration < maxIterations) {
      if (!fresh) {
        this.linearise();
        fresh = true;
        if (this.offset < tolerance) {
          reason = 'relative-offset';
          break;
        }
      }
      this.iteration++;
      const outcome = this.tryStep();
      if (outcome === 'accepted' && this.o.interrupt?.(this.u)) {
        reason = 'interrupted';
        break;
      }
      if (outcome === 'accepted') fresh = false;
      else if (outcome !== 'rejected') {
        reason = outcome;
        break;
      }
    }
    // A step that no longer moves (or no descent found) still counts as converged when the linear model predicts a
    // remaining decrease of S below 1 % of one residual variance per parameter (offset < 0.1): noise-free data,
    // whose residuals are the model's own discretisation error, end this way.
    const converged = reason === 'relative-offset' || ((reason === 'step' || reason === 'no-descent') && this.offset < 0.1);
    return { u: this.u, residuals: this.r, costA2: this.cost, iterations: this.iteration, evaluations: this.ev.count, converged, reason, relativeOffset: this.offset };
  }

  /** Jacobian, normal equations and relative offset at the current point. */
  private linearise(): void {
    this.ev.jacobian(this.u, this.r, this.jac);
    this.system = normalEquations(this.jac, this.r);
    const free = this.freeSet(this.system.g.map((x) => -x));
    this.offset = relativeOffset(restrict(this.system.a, free), free.map((i) => this.system.g[i] as number), this.cost, this.r.length);
    this.o.onProgress?.({ iteration: this.iteration, costA2: this.cost, evaluations: this.ev.count, relativeOffset: this.offset });
  }

  /** Indices not held at a limit by a step `d` that points outward there. */
  private freeSet(d: number[]): number[] {
    const { lower, upper } = this.problem;
    return d.map((_, i) => i).filter((i) => !((this.u[i]! <= lower[i]! && d[i]! < 0) || (this.u[i]! >= upper[i]! && d[i]! > 0)));
  }

  /** The damped step with parameters at a limit held when the step would push them out. */
  private projectedStep(): number[] | null {
    const { a, g } = this.system;
    let free = a.map((_, i) => i);
    for (let pass = 0; pass <= a.length; pass++) {
      const sub = solveDamped(restrict(a, free), free.map((i) => -(g[i] as number)), this.lambda);
      if (!sub) return null;
      const step = new Array<number>(a.length).fill(0);
      free.forEach((i, k) => { step[i] = sub[k] as number; });
      const next = this.freeSet(step).filter((i) => free.includes(i));
      if (next.length === free.length) return step;
      free = next;
      if (free.length === 0) return step;
    }
    return null;
  }

  private tryStep(): 'accepted' | 'rejected' | 'step' | 'no-descent' {
    const step = this.projectedStep();
    if (!step) return this.reject();
    const { lower, upper } = this.problem;
    const uNew = this.u.map((x, i) => Math.min(Math.max(x + (step[i] as number), lower[i] as number), upper[i] as number));
    const delta = Array.from(uNew, (x, i) => x - (this.u[i] as number));
    if (Math.max(...delta.map(Math.abs)) < (this.o.stepTolerance ?? 1e-7)) return 'step';
    const costNew = this.ev.run(uNew, this.trial);
    // Gain predicted by the linear model for the step actually taken: S − ‖r + Jδ‖² = −2gᵀδ − δᵀAδ.
    const { a, g } = this.system;
    const predicted = -delta.reduce((s, d, i) => s + d * (2 * (g[i] as number) + delta.reduce((t, e, j) => t + (a[i] as number[])[j]! * e, 0)), 0);
    const rho = (this.cost - costNew) / predicted;
    if (!(Number.isFinite(costNew) && predicted > 0 && rho > 0)) return this.reject();
    [this.u, this.r, this.trial] = [uNew, this.trial, this.r];
    this.cost = costNew;
    this.lambda *= Math.max(1 / 3, 1 - (2 * rho - 1) ** 3);
    this.nu = 2;
    return 'accepted';
  }

  private reject(): 'rejected' | 'no-descent' {
    this.lambda *= this.nu;
    this.nu *= 2;
    return this.lambda > 1e16 ? 'no-descent' : 'rejected';
  }
}

function restrict(a: number[][], idx: number[]): number[][] {
  return idx.map((i) => idx.map((j) => (a[i] as number[])[j] as number));
}

/** Bates–Watts relative offset √(gᵀA⁻¹g/p) / √(S/(m−p)); 0 when no parameter is free. */
function relativeOffset(a: number[][], g: number[], cost: number, m: number): number {
  const p = g.length;
  if (p === 0) return 0;
  const x = solveDamped(a, g, 1e-12);
  if (!x) return Infinity;
  const projected = x.reduce((s, xi, i) => s + xi * (g[i] as number), 0);
  return Math.sqrt(Math.max(projected, 0) / p) / Math.sqrt(cost / (m - p));
}
