/**
 * Fuzz suite (issue items 6, 7 and 12): 20,000+ seeded inputs (test/fuzz/fuzzInputs.ts: random
 * bytes, random table text, mutated real layouts, enormous and empty fields, deep quoting, NUL
 * bytes, mixed encodings, tables up to 10⁶ columns, random overrides, hostile shapes) through the
 * importer and the analysis, plus random voltammograms straight into the analysis. Every input
 * must end in a result, an ImportError or an AnalysisError, and text families must read the same
 * through the fast path and through papaparse alone. Two worker threads run the inputs; each input
 * has a hang guard of 10 s (a guard against hangs, not a speed check: inputs take milliseconds
 * to about a second). A failure names the family and index, which rebuild the input exactly.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Outcome } from './fuzzRunner';
import { ALL_FAMILIES, sizeOf, SPIN_FAMILY } from './fuzzRunner';
import type { FuzzJob, WorkerMessage } from './fuzzWorkerLoop';

const HANG_GUARD_MS = 10_000;
/** A backstop for a whole family if a worker dies silently; the hang guard fires long before. */
const FAMILY_TIMEOUT_MS = 600_000;

interface Done {
  counts: Record<string, number>;
  failures: Outcome[];
  inputs: number;
}

function startWorker(): Promise<Worker> {
  const w = new Worker(new URL('./fuzzWorker.mjs', import.meta.url));
  return new Promise((resolve, reject) => {
    w.once('error', reject);
    w.once('message', (m: WorkerMessage) => (m.type === 'ready' ? resolve(w) : reject(new Error(`unexpected first message ${m.type}`))));
  });
}

/** Runs one job; rejects naming the input when one runs past the hang guard (the worker is then stopped). */
function runJob(w: Worker, job: FuzzJob, guardMs = HANG_GUARD_MS): Promise<Done> {
  return new Promise((resolve, reject) => {
    let guard: ReturnType<typeof setTimeout> | undefined;
    const stop = () => {
      clearTimeout(guard);
      w.off('message', onMessage);
      w.off('error', onError);
    };
    const onError = (err: Error) => {
      stop();
      reject(err);
    };
    const onMessage = (m: WorkerMessage) => {
      clearTimeout(guard);
      if (m.type === 'start') {
        guard = setTimeout(() => {
          stop();
          void w.terminate();
          reject(new Error(`hang: ${m.family} #${m.index} ran past ${guardMs / 1000} s (rebuild it with buildInput('${m.family}', ${m.index}))`));
        }, guardMs);
      } else if (m.type === 'done') {
        stop();
        resolve(m);
      }
    };
    w.on('message', onMessage);
    w.on('error', onError);
    w.postMessage(job);
  });
}

describe('fuzz: importer and analysis end in a result or a typed error', () => {
  const workers: Worker[] = [];
  const totals: Record<string, number> = {};
  let inputs = 0;

  beforeAll(async () => {
    const n = Math.max(1, Math.min(2, availableParallelism()));
    workers.push(...(await Promise.all(Array.from({ length: n }, startWorker))));
  }, 120_000);

  afterAll(async () => {
    await Promise.all(workers.map((w) => w.terminate()));
    console.log(`[fuzz] ${inputs} inputs: ${Object.entries(totals).sort((a, b) => b[1] - a[1]).map(([k, v]) => `${k} ${v}`).join(', ')}`);
  });

  for (const family of ALL_FAMILIES) {
    it(`${family}: ${sizeOf(family)} seeded inputs`, async () => {
      const step = workers.length;
      const done = await Promise.all(workers.map((w, k) => runJob(w, { family, from: k, to: sizeOf(family), step })));
      for (const d of done) {
        inputs += d.inputs;
        for (const [kind, c] of Object.entries(d.counts)) totals[kind] = (totals[kind] ?? 0) + c;
      }
      const failures = done.flatMap((d) => d.failures);
      expect(failures.map((f) => `${f.family} #${f.index}: ${f.detail ?? ''}`.slice(0, 800))).toEqual([]);
      expect(done.reduce((n, d) => n + d.inputs, 0)).toBe(sizeOf(family));
    }, FAMILY_TIMEOUT_MS);
  }

  it('ran at least 20,000 inputs in all', () => {
    expect(inputs).toBeGreaterThanOrEqual(20_000);
  });
});

describe('fuzz hang guard', () => {
  it('stops a worker whose input runs past the guard and names the input', async () => {
    const w = await startWorker();
    await expect(runJob(w, { family: SPIN_FAMILY, from: 3, to: 4, step: 1 }, 300)).rejects.toThrow(`hang: ${SPIN_FAMILY} #3 ran past 0.3 s`);
    await w.terminate();
  }, 120_000);
});
