/**
 * A folder of six exports of one scan-rate series, written to a temporary directory: the
 * Nernstian couple of our own simulator (src/state/testSupport.ts: E°′ = 0 V, 1 mM, 0.0707 cm²,
 * D = 1e-5 cm²/s) at 0.02–0.5 V/s, as a potentiostat would export them.
 */
import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulatedCsv } from './appHelpers';

export const SIX_RATES_V_PER_S = [0.02, 0.05, 0.1, 0.2, 0.3, 0.5];

export async function sixExportFolder(name = 'RuHex scan rates'): Promise<{ dir: string; remove: () => Promise<void> }> {
  const root = await mkdtemp(join(tmpdir(), 'halfwave-six-'));
  const dir = join(root, name);
  await mkdir(dir);
  for (const v of SIX_RATES_V_PER_S) await writeFile(join(dir, `cv_${String(Math.round(v * 1000)).padStart(3, '0')}mVs.csv`), simulatedCsv(v));
  return { dir, remove: () => rm(root, { recursive: true }) };
}
