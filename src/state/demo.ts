/**
 * The demo voltammograms shipped with the app (written by `npm run demo-data` from our own
 * simulator into demo-data/), served from the app's own origin as one file (made by
 * scripts/demoBundle.ts, which documents its layout; index.html names it in a preload link, so its
 * download starts with the page's). The page never parses the voltammograms: the analysis workers
 * read their bytes.
 */
import type { SeriesCell } from '../run/seriesCell';
import type { FileInput } from './types';

/** The demo files, or why there are none. */
export interface DemoInputs {
  inputs: FileInput[];
  problem: string | null;
}

/** The id of the preload link that names the demo file (scripts/demoBundle.ts writes it). */
const DEMO_LINK_ID = 'halfwave-demo';

/** Fetches the demo file the page's preload link names; none when the page names none. */
export async function fetchDemoInputs(): Promise<DemoInputs> {
  const href = typeof document === 'undefined' ? null : document.getElementById(DEMO_LINK_ID)?.getAttribute('href');
  if (!href) return { inputs: [], problem: null };
  try {
    const res = await fetch(href);
    if (!res.ok) throw new Error(`HTTP ${res.status}`);
    return { inputs: demoInputsOf(new Uint8Array(await res.arrayBuffer())), problem: null };
  } catch (err) {
    return { inputs: [], problem: `The demo voltammograms could not be loaded from the app's own server (${err instanceof Error ? err.message : String(err)}).` };
  }
}

/** The files of a demo bundle (a JSON line naming each file and its length, then their bytes), in its order. */
export function demoInputsOf(bundle: Uint8Array<ArrayBuffer>): FileInput[] {
  const eol = bundle.indexOf(0x0a);
  if (eol < 0) throw new Error('the demo file has no header line');
  const head = JSON.parse(new TextDecoder().decode(bundle.subarray(0, eol))) as { files?: unknown };
  if (!Array.isArray(head.files)) throw new Error('the demo file names no files');
  const parts: Array<{ name: string; start: number; end: number }> = [];
  let at = eol + 1;
  for (const f of head.files as Array<{ name?: unknown; bytes?: unknown }>) {
    if (typeof f?.name !== 'string' || !Number.isInteger(f.bytes) || (f.bytes as number) < 0) throw new Error('the demo file\'s header line is not a list of names and lengths');
    parts.push({ name: f.name, start: at, end: at + (f.bytes as number) });
    at += f.bytes as number;
  }
  if (at !== bundle.length) throw new Error(`the demo file holds ${bundle.length - eol - 1} bytes after its header, not the ${at - eol - 1} it names`);
  // Views on the one buffer: each file's bytes are copied only as they are sent to a worker.
  return parts.map((p) => ({ name: p.name, data: bundle.subarray(p.start, p.end) }));
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
