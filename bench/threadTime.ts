/**
 * CPU time of Chromium's threads, from Linux's per-thread scheduler statistics
 * (`/proc/<pid>/task/<tid>/schedstat`: nanoseconds run, nanoseconds waited for a core), summed by
 * the part they play. Steadier than a wall time on a shared two-core machine, and it says who
 * took the cores: the analysis workers, the page's thread, or the renderer's pool (the engine's
 * optimising compilers, raster, garbage collection). Elsewhere than Linux it reads nothing.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';

/** Nanoseconds run and waited per thread, keyed "pid/tid", with the thread's role. */
export type ThreadSnapshot = Map<string, { role: ThreadRole | null; runNs: number; waitNs: number }>;

export type ThreadRole = 'workers' | 'page' | 'pool';

/** A renderer thread's role from its name (`comm`): the page's main thread keeps the program's name. */
function roleOf(processType: string, comm: string): ThreadRole | null {
  if (processType !== 'renderer') return null;
  if (comm.startsWith('DedicatedWorker')) return 'workers';
  if (comm.startsWith('ThreadPoolForeg')) return 'pool';
  if (comm === 'chromium' || comm === 'chrome' || comm.startsWith('CrRendererMain')) return 'page';
  return null;
}

function read(path: string): string | null {
  try {
    return readFileSync(path, 'utf8');
  } catch {
    return null;
  }
}

function tasksOf(pid: string): string[] {
  try {
    return readdirSync(`/proc/${pid}/task`);
  } catch {
    return [];
  }
}

export function chromiumThreads(): ThreadSnapshot {
  const out: ThreadSnapshot = new Map();
  if (!existsSync('/proc/self/task')) return out;
  for (const pid of readdirSync('/proc').filter((p) => /^\d+$/.test(p))) {
    const cmd = read(`/proc/${pid}/cmdline`);
    if (!cmd || !/chrom/.test(cmd)) continue;
    const type = /--type=([a-z-]+)/.exec(cmd)?.[1] ?? 'browser';
    for (const tid of tasksOf(pid)) {
      const stat = read(`/proc/${pid}/task/${tid}/schedstat`);
      const comm = read(`/proc/${pid}/task/${tid}/comm`);
      if (!stat || comm === null) continue;
      const [runNs, waitNs] = stat.trim().split(/\s+/).map(Number);
      out.set(`${pid}/${tid}`, { role: roleOf(type, comm.trim()), runNs: runNs ?? 0, waitNs: waitNs ?? 0 });
    }
  }
  return out;
}

/** Milliseconds of CPU each role used between two snapshots, and the workers' wait for a core; null where nothing was read. */
export function threadTimeBetween(before: ThreadSnapshot, after: ThreadSnapshot): { workers: number; page: number; pool: number; workersWaited: number } | null {
  if (after.size === 0) return null;
  const sum = { workers: 0, page: 0, pool: 0, workersWaited: 0 };
  for (const [key, t] of after) {
    if (!t.role) continue;
    const b = before.get(key) ?? { runNs: 0, waitNs: 0 };
    sum[t.role] += (t.runNs - b.runNs) / 1e6;
    if (t.role === 'workers') sum.workersWaited += (t.waitNs - b.waitNs) / 1e6;
  }
  return sum;
}

/**
 * Resolves once Chromium's page, workers and pool have used under `idleMs` of CPU over a window of
 * `windowMs` (or after `timeoutMs`): work the page does after what is timed (an autosave of the
 * files, a fit) must not share the cores with the Node run that is the yardstick. Elsewhere than
 * Linux it resolves at once. Returns whether the browser went quiet.
 */
export async function chromiumQuiet(windowMs = 300, idleMs = 5, timeoutMs = 15_000): Promise<boolean> {
  const t0 = Date.now();
  let before = chromiumThreads();
  if (before.size === 0) return true;
  while (Date.now() - t0 < timeoutMs) {
    await new Promise((r) => setTimeout(r, windowMs));
    const after = chromiumThreads();
    const used = threadTimeBetween(before, after);
    if (used && used.workers + used.page + used.pool < idleMs) return true;
    before = after;
  }
  return false;
}
