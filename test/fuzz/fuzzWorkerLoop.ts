/**
 * The fuzz worker's loop: for each job (a family and a stride of its indices) it announces every
 * input before running it, so the test thread can stop a worker whose input runs past the hang
 * guard, then reports the outcome counts and any failures.
 */
import { parentPort } from 'node:worker_threads';
import { runOne } from './fuzzRunner';
import type { Outcome } from './fuzzRunner';

export interface FuzzJob {
  family: string;
  from: number;
  to: number;
  step: number;
}

export type WorkerMessage =
  | { type: 'ready' }
  | { type: 'start'; family: string; index: number }
  | { type: 'done'; counts: Record<string, number>; failures: Outcome[]; inputs: number };

const port = parentPort;
if (!port) throw new Error('fuzzWorkerLoop runs in a worker thread');
const send = (m: WorkerMessage) => port.postMessage(m);

port.on('message', (job: FuzzJob) => {
  const counts: Record<string, number> = {};
  const failures: Outcome[] = [];
  let inputs = 0;
  for (let i = job.from; i < job.to; i += job.step) {
    send({ type: 'start', family: job.family, index: i });
    const o = runOne(job.family, i);
    counts[o.kind] = (counts[o.kind] ?? 0) + 1;
    if (o.kind === 'FAILURE') failures.push(o);
    inputs++;
  }
  send({ type: 'done', counts, failures, inputs });
});
send({ type: 'ready' });
