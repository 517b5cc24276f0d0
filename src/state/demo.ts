/**
 * The demo voltammograms shipped with the app (written by `npm run demo-data` from our own
 * simulator into demo-data/). Bundled same-origin by Vite as one lazily loaded chunk
 * (demoFiles.ts), never fetched from another host.
 */
import type { SeriesCell } from './seriesCell';
import type { FileInput } from './types';

export async function loadDemoInputs(): Promise<FileInput[]> {
  const { DEMO_FILES } = await import('./demoFiles');
  return Object.keys(DEMO_FILES).sort().map((path) => ({ name: path.slice(path.lastIndexOf('/') + 1), data: DEMO_FILES[path] as string }));
}

/**
 * Cell of each demo series as the (fictional) experimenter would enter it: electrode area,
 * analyte concentration and electrons per molecule. The numbers mirror the scenario's truth
 * tables in demo-data/README.md (source: scripts/demoData/scenario.ts, not imported here because
 * the app bundle must not carry the generator). Keys are the group names `demoGroup` gives.
 */
export const DEMO_SERIES_CELLS: Record<string, Partial<SeriesCell>> = {
  // hexaammineruthenium(III), 1.0 mM, CPE-7 3 mm disk
  'probe RuHex': { electronCount: 1, areaCm2: 0.0707, concentrationMM: 1 },
  // ferrocenyl amide FcAm-2, 0.5 mM, CPE-7 3 mm disk
  'quasi FcAmide': { electronCount: 1, areaCm2: 0.0707, concentrationMM: 0.5 },
  // aminophenol AP-3, 1.0 mM, two electrons, CPE-7 3 mm disk
  'ec aminophenol': { electronCount: 2, areaCm2: 0.0707, concentrationMM: 1 },
  // ferrocenyl-thiol monolayer on a 2 mm gold disk (no solution species: concentration not used)
  'film FcSAM': { electronCount: 1, areaCm2: 0.0314 },
};
