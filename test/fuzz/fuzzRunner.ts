/**
 * One fuzz input, end to end: import it (ImportError is the only failure allowed), analyse what
 * was imported (AnalysisError is the only failure allowed), and, for text-like families, import
 * it again through the papaparse-only reader and require the same result bit for bit. The
 * 'analysis' family sends random voltammograms (NaN, Inf, constant, one point, odd segments and
 * options) straight to analyzeVoltammogram.
 */
import { analyzeVoltammogram } from '../../src/core/analysis/analyzeVoltammogram';
import type { AnalyzeVoltammogramOptions } from '../../src/core/analysis/types';
import { AnalysisError } from '../../src/core/errors';
import { findSweepSegments } from '../../src/core/sweeps/findSweepSegments';
import type { Voltammogram } from '../../src/core/types';
import { ImportError } from '../../src/io/errors';
import { importVoltammogram } from '../../src/io/importVoltammogram';
import type { ImportResult } from '../../src/io/types';
import { buildInput, familySize, FAMILY_NAMES } from './fuzzInputs';
import { Rng } from './fuzzRandom';

export interface Outcome {
  family: string;
  index: number;
  /** 'result', 'ImportError:CODE', 'AnalysisError:CODE', or 'FAILURE' (anything else). */
  kind: string;
  detail?: string;
}

export const ANALYSIS_FAMILY = { name: 'analysis', count: 1000 };
export const ALL_FAMILIES = [...FAMILY_NAMES, ANALYSIS_FAMILY.name];
export const sizeOf = (family: string) => (family === ANALYSIS_FAMILY.name ? ANALYSIS_FAMILY.count : familySize(family));

/** Families whose quote-free chunks take the fast path: compared with the papaparse reader. */
const COMPARED = new Set(['tableText', 'mutatedLayouts', 'hugeFields', 'nulBytes', 'mixedEncodings', 'quoting']);

/** Not an input family: spins for a minute, so that the test can watch the hang guard fire. */
export const SPIN_FAMILY = 'spinForHangGuardTest';

export function runOne(family: string, index: number): Outcome {
  if (family === SPIN_FAMILY) {
    for (const end = Date.now() + 60_000; Date.now() < end; );
    return { family, index, kind: 'result' };
  }
  try {
    return family === ANALYSIS_FAMILY.name ? analyseRandom(index) : importAndAnalyse(family, index);
  } catch (err) {
    return { family, index, kind: 'FAILURE', detail: err instanceof Error ? `${err.name}: ${err.message}\n${err.stack ?? ''}`.slice(0, 2000) : String(err) };
  }
}

function typed(err: unknown): string {
  if (err instanceof ImportError) return `ImportError:${err.code}`;
  if (err instanceof AnalysisError) return `AnalysisError:${err.code}`;
  throw err;
}

function importAndAnalyse(family: string, index: number): Outcome {
  const input = buildInput(family, index);
  const options = input.overrides ? { overrides: input.overrides } : {};
  let result: ImportResult | null = null;
  let kind: string;
  try {
    result = importVoltammogram(input.name, input.data, options);
    kind = 'result';
  } catch (err) {
    kind = typed(err);
  }
  if (COMPARED.has(family)) {
    const reference = fingerprint(() => importVoltammogram(input.name, input.data, { ...options, tableReader: 'papaparse' }));
    const fast = fingerprint(() => result ?? importVoltammogram(input.name, input.data, options));
    if (reference !== fast) return { family, index, kind: 'FAILURE', detail: `fast path and papaparse differ:\n${fast.slice(0, 500)}\n${reference.slice(0, 500)}` };
  }
  if (result) {
    try {
      analyzeVoltammogram(result.measurement, { currentConvention: result.measurement.currentConvention });
    } catch (err) {
      kind = typed(err);
    }
  }
  return { family, index, kind };
}

/** Everything the two readers must agree on, as text (NaN and −0 spelled out). */
function fingerprint(run: () => ImportResult): string {
  try {
    const { measurement: m, warnings } = run();
    const cols = [m.potentialV, m.currentA, m.timeS ?? new Float64Array(0), ...Object.values(m.extraColumns)];
    const numbers = cols.map((c) => Array.from(c, (x) => (Object.is(x, -0) ? '-0' : String(x))).join(',')).join('|');
    return JSON.stringify({ d: { ...m.detection, headLines: null }, warnings, numbers, segments: m.segments, cycles: m.cycles });
  } catch (err) {
    return err instanceof ImportError ? `${err.code}: ${err.message}` : `untyped ${String(err)}`;
  }
}

function analyseRandom(index: number): Outcome {
  const r = new Rng('analysis', index);
  const v = randomVoltammogram(r);
  try {
    analyzeVoltammogram(v, randomOptions(r));
    return { family: 'analysis', index, kind: 'result' };
  } catch (err) {
    return { family: 'analysis', index, kind: typed(err) };
  }
}

function randomVoltammogram(r: Rng): Voltammogram {
  const n = r.pick([0, 1, 2, 3, 5, 6, 50, 500, 5000]);
  const shape = r.int(0, 5);
  const potentialV = Float64Array.from({ length: n }, (_, i) => [Math.abs((i % 200) - 100) * 0.01, r.next(), 0.25, i % 2, i * 1e-300, (i % 100) * 1e300][shape] as number);
  const currentA = Float64Array.from({ length: n }, (_, i) => r.pick([Math.sin(i / 7) * 1e-6, r.next() - 0.5, 0, 1e300, -1e-300, Math.exp(-(((i % 200) - 60) ** 2) / 50)]));
  if (n && r.chance(0.1)) currentA[r.int(0, n - 1)] = r.pick([NaN, Infinity]);
  if (n && r.chance(0.1)) potentialV[r.int(0, n - 1)] = r.pick([NaN, -Infinity]);
  const timeS = r.chance(0.4) ? Float64Array.from({ length: r.chance(0.9) ? n : n + 1 }, (_, i) => (r.chance(0.95) ? i * 0.01 : r.next())) : null;
  let split = { segments: [] as Voltammogram['segments'], cycles: [] as Voltammogram['cycles'] };
  try {
    split = findSweepSegments(potentialV);
  } catch (err) {
    typed(err);
  }
  if (r.chance(0.2)) split.segments = [{ start: r.int(-2, n), end: r.int(-2, n + 3), direction: r.pick(['positive', 'negative'] as const), cycle: r.int(0, 3) }];
  if (r.chance(0.1)) split.cycles = [{ index: r.int(0, 3), start: r.int(-1, n), end: r.int(-1, n + 2) }];
  return { potentialV, currentA, timeS, ...split, scanRateVPerS: r.pick([null, 0.1, 0, -1, NaN, 1e12]), scanRateSource: null };
}

function randomOptions(r: Rng): AnalyzeVoltammogramOptions {
  const o: AnalyzeVoltammogramOptions = {};
  if (r.chance(0.2)) o.electronCount = r.pick([0, 1, 2, 1.5, 13, NaN]);
  if (r.chance(0.2)) o.temperatureK = r.pick([298.15, 0, -5, NaN, 1e6]);
  if (r.chance(0.2)) o.smoothing = r.pick(['off', { window: 5, order: 2 }, { window: 4, order: 2 }, { window: 3, order: 5 }, { window: 100001, order: 2 }, { window: 1.5, order: 1 }] as const);
  if (r.chance(0.2)) o.peakWindows = [{ direction: r.pick(['anodic', 'cathodic'] as const), fromV: r.pick([0, 0.2, NaN, 5]), toV: r.pick([0.5, 0, Infinity, -5]) }];
  if (r.chance(0.2)) o.cycles = [r.int(-1, 4)];
  if (r.chance(0.1)) o.minRelativeProminence = r.pick([0, 1, 2, -1]);
  if (r.chance(0.1)) o.scanRateVPerS = r.pick([0.1, -0.1, 0, NaN]);
  return o;
}

export { FAMILY_NAMES };
