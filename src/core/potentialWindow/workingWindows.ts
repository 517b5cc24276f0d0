/**
 * Table of working potential windows: for each working-electrode material in each common medium,
 * the potentials beyond which the background current rises steeply (solvent or electrolyte
 * breakdown: hydrogen or oxygen evolution, oxidation of the electrode or of the anion, reduction of
 * the tetraalkylammonium cation), each limit with the process and its source.
 * Units: V, on the scale named by the entry's `reference` (aqueous media: SHE at the medium's
 * nominal pH; the organic medium: aqueous SCE, as such windows are usually quoted).
 * Source: every limit here is "common practice, from memory" (no handbook table was at hand); the
 * aqueous hydrogen limits were checked for the Nernstian shift of −(ln 10)RT/F per pH unit between
 * media (workingWindows.test.ts). Real windows depend on the electrolyte, its purity and dryness,
 * the electrode's history and the current density taken as the limit (typically 0.1–1 mA/cm²),
 * so they are guides (±0.2 V), shown as such, and the user can replace any limit.
 * Safety: at the negative limit in aqueous media the electrode evolves hydrogen (flammable); at the
 * positive limit in chloride media the counter reactions can give chlorine.
 */
import { AnalysisError } from '../errors';
import type { ReferenceId } from '../reference';

export type ElectrodeMaterial = 'platinum' | 'gold' | 'glassy-carbon' | 'carbon-paste' | 'boron-doped-diamond';
export type WindowMedium = 'aqueous-acid' | 'aqueous-neutral' | 'aqueous-base' | 'acetonitrile-tetraalkylammonium';

export interface WindowLimit {
  /** Potential of the limit (V vs the entry's reference). */
  potentialV: number;
  /** What sets the limit, in words. */
  process: string;
  source: string;
}

export interface WorkingWindowEntry {
  material: ElectrodeMaterial;
  medium: WindowMedium;
  reference: ReferenceId;
  /** Negative (cathodic) and positive (anodic) limits; null where the combination is not usable. */
  lower: WindowLimit | null;
  upper: WindowLimit | null;
  note: string | null;
}

export const ELECTRODE_MATERIALS: readonly { id: ElectrodeMaterial; label: string }[] = [
  { id: 'platinum', label: 'platinum (Pt)' },
  { id: 'gold', label: 'gold (Au)' },
  { id: 'glassy-carbon', label: 'glassy carbon' },
  { id: 'carbon-paste', label: 'carbon paste' },
  { id: 'boron-doped-diamond', label: 'boron-doped diamond' },
];

export const WINDOW_MEDIA: readonly { id: WindowMedium; label: string; pH: number | null }[] = [
  { id: 'aqueous-acid', label: 'aqueous acid (e.g. 0.5 M H₂SO₄, pH ≈ 0)', pH: 0 },
  { id: 'aqueous-neutral', label: 'aqueous neutral (e.g. phosphate buffer, pH ≈ 7)', pH: 7 },
  { id: 'aqueous-base', label: 'aqueous base (e.g. 0.1 M NaOH, pH ≈ 13)', pH: 13 },
  { id: 'acetonitrile-tetraalkylammonium', label: 'acetonitrile + 0.1 M Bu₄NPF₆ (dry)', pH: null },
];

const MEMORY = 'common practice, from memory (±0.2 V)';
const H2 = 'hydrogen evolution';
const O2 = 'oxygen evolution';

/** [material, medium, lower V, lower process, upper V, upper process, note]. */
type Row = [ElectrodeMaterial, WindowMedium, number | null, string, number | null, string, string | null];

const ROWS: Row[] = [
  ['platinum', 'aqueous-acid', -0.05, H2, 1.6, `${O2} (Pt oxide forms from about +0.8 V)`, 'hydrogen adsorption waves between 0 and +0.35 V are part of the background'],
  ['platinum', 'aqueous-neutral', -0.45, H2, 1.2, O2, null],
  ['platinum', 'aqueous-base', -0.82, H2, 0.8, O2, null],
  ['platinum', 'acetonitrile-tetraalkylammonium', -2.5, 'reduction of the tetraalkylammonium cation', 2.4, 'oxidation of the solvent and anion', 'traces of water narrow the window'],
  ['gold', 'aqueous-acid', -0.25, H2, 1.5, `${O2} (Au oxide forms from about +1.3 V)`, null],
  ['gold', 'aqueous-neutral', -0.7, H2, 1.2, 'gold oxidation and oxygen evolution', 'chloride attacks gold at positive potentials'],
  ['gold', 'aqueous-base', -1.05, H2, 0.7, 'gold oxidation and oxygen evolution', null],
  ['gold', 'acetonitrile-tetraalkylammonium', -2.5, 'reduction of the tetraalkylammonium cation', 1.5, 'gold oxidation', null],
  ['glassy-carbon', 'aqueous-acid', -0.7, H2, 1.4, 'carbon and water oxidation', null],
  ['glassy-carbon', 'aqueous-neutral', -1.15, H2, 1.3, 'carbon and water oxidation', null],
  ['glassy-carbon', 'aqueous-base', -1.5, H2, 0.8, O2, null],
  ['glassy-carbon', 'acetonitrile-tetraalkylammonium', -2.7, 'reduction of the tetraalkylammonium cation', 2.4, 'oxidation of the solvent and anion', null],
  ['carbon-paste', 'aqueous-acid', -0.7, H2, 1.3, 'carbon and binder oxidation', 'dissolved oxygen in the paste gives a reduction wave near −0.2 V vs SHE'],
  ['carbon-paste', 'aqueous-neutral', -1.15, H2, 1.2, 'carbon and binder oxidation', null],
  ['carbon-paste', 'aqueous-base', -1.5, H2, 0.9, O2, null],
  ['carbon-paste', 'acetonitrile-tetraalkylammonium', null, '', null, '', 'not usable: the pasting liquid dissolves in the organic solvent'],
  ['boron-doped-diamond', 'aqueous-acid', -1.1, H2, 2.3, O2, 'the widest aqueous window of these materials'],
  ['boron-doped-diamond', 'aqueous-neutral', -1.45, H2, 2.0, O2, null],
  ['boron-doped-diamond', 'aqueous-base', -1.85, H2, 1.4, O2, null],
  ['boron-doped-diamond', 'acetonitrile-tetraalkylammonium', -2.7, 'reduction of the tetraalkylammonium cation', 2.5, 'oxidation of the solvent and anion', null],
];

export const WORKING_WINDOWS: readonly WorkingWindowEntry[] = ROWS.map(([material, medium, lo, loWhat, hi, hiWhat, note]) => ({
  material, medium,
  reference: medium === 'acetonitrile-tetraalkylammonium' ? 'SCE' : 'SHE',
  lower: lo === null ? null : { potentialV: lo, process: loWhat, source: MEMORY },
  upper: hi === null ? null : { potentialV: hi, process: hiWhat, source: MEMORY },
  note,
}));

/** The table's window of `material` in `medium`; throws BAD_OPTION for a combination it lacks. */
export function workingWindow(material: ElectrodeMaterial, medium: WindowMedium): WorkingWindowEntry {
  const entry = WORKING_WINDOWS.find((w) => w.material === material && w.medium === medium);
  if (!entry) throw new AnalysisError('BAD_OPTION', `no working window for material "${material}" in medium "${medium}"`);
  return entry;
}
