/** The setup of a series' fit: mechanism, couples, free parameters, window, comparison; Fit, its progress and Cancel. */
import { freeChoicesOf, type FitComparisonChoice, type FitMechanism, type FitParameter } from '../../state/fitView';
import type { DisplayScale } from '../../state/display';
import { halfwaveActions, useHalfwave } from '../../state/react';
import type { FitSetup } from '../../state/types';
import { NumberField } from './NumberField';
import { SelectField } from './SelectField';
import { FitProgress } from './FitProgress';

const MECHANISMS: { value: FitMechanism; label: string }[] = [
  { value: 'E', label: 'E: electron transfer only' },
  { value: 'EC', label: 'EC: followed by a first-order reaction' },
  { value: 'surface', label: 'Surface: adsorbed film' },
];

const COMPARISONS: Record<FitMechanism, { value: FitComparisonChoice; label: string }[]> = {
  E: [{ value: 'none', label: 'this model only' }, { value: 'mechanism', label: 'E and EC, by BIC' }, { value: 'ru', label: 'R_u fitted and held, by BIC' }],
  EC: [{ value: 'none', label: 'this model only' }, { value: 'mechanism', label: 'E and EC, by BIC' }, { value: 'ru', label: 'R_u fitted and held, by BIC' }],
  surface: [{ value: 'none', label: 'this model only' }, { value: 'ru', label: 'R_u fitted and held, by BIC' }],
};

/** How each parameter reads in the list of free parameters. */
export const PARAMETER_LABELS: Record<FitParameter, string> = {
  formalPotentialV: 'E°′ formal potential',
  k0CmPerS: 'k° standard rate constant',
  alpha: 'α transfer coefficient',
  diffusionOCm2PerS: 'D_O diffusion coefficient',
  diffusionRatio: 'D_O/D_R ratio',
  followUpRatePerS: 'k_f follow-up reaction',
  coverageMolPerCm2: 'Γ surface coverage',
  surfaceRatePerS: 'k_s film rate constant',
  uncompensatedOhm: 'R_u uncompensated resistance',
  doubleLayerFPerCm2: 'C_dl double-layer capacitance',
  background: 'sloping background, each file',
};

const round = (v: number) => Number(v.toFixed(4));

export function FitSetupForm({ group, setup, scale }: { group: string; setup: FitSetup; scale: DisplayScale }) {
  const running = useHalfwave((s) => s.fits[group]?.status === 'running');
  const fileCount = useHalfwave((s) => s.series[group]?.fileIds.length ?? 0);
  // Cycles every file of the series has (the fit needs the chosen cycle in each).
  const cycles = useHalfwave((s) => Math.max(1, Math.min(...(s.series[group]?.fileIds ?? []).map((id) => s.files[id]?.measurement?.cycles.length ?? 1))));
  const act = halfwaveActions();
  const change = (patch: Partial<FitSetup>) => act.setFitSetup(group, patch);
  // From the store at event time, so quick clicks build on each other (components render once per frame).
  const toggle = (p: FitParameter, on: boolean) => {
    const free = act.fitSetupOf(group).free;
    change({ free: on ? [...free.filter((x) => x !== p), p] : free.filter((x) => x !== p) });
  };
  const shown = setup.windowV ? setup.windowV.map((v) => round(v + scale.offsetV)) : null;
  const setEnd = (k: 0 | 1, v: number | null) => {
    if (v === null) return;
    const stored = act.fitSetupOf(group).windowV;
    const other = stored ? round((stored[1 - k] as number) + scale.offsetV) : v;
    const ends = (k === 0 ? [v, other] : [other, v]).map((x) => x - scale.offsetV) as [number, number];
    change({ windowV: ends });
  };
  return (
    <form className="fit-setup" aria-label="Fit setup" onSubmit={(e) => { e.preventDefault(); void act.runFit(group); }}>
      <SelectField label="Mechanism" value={setup.mechanism} options={MECHANISMS} testId="fit-mechanism" onChange={(m) => change({ mechanism: m })} />
      <SelectField label="Couples in the record" value={String(setup.coupleCount)} options={['1', '2', '3', '4'].map((v) => ({ value: v, label: v }))}
        testId="fit-couples" onChange={(v) => change({ coupleCount: Number(v) })} />
      <SelectField label="Cycle fitted" value={String(Math.min(setup.cycle ?? 1, cycles))} options={Array.from({ length: cycles }, (_, k) => ({ value: String(k + 1), label: k === 0 ? '1 (earlier cycles are simulated too)' : String(k + 1) }))}
        testId="fit-cycle" onChange={(v) => change({ cycle: Number(v) })} />
      <fieldset className="fit-free" data-testid="fit-free">
        <legend>Fitted (unticked values are held)</legend>
        {freeChoicesOf(setup.mechanism).map((p) => (
          <label key={p} className="check">
            <input type="checkbox" checked={setup.free.includes(p)} data-testid={`fit-free-${p}`} onChange={(e) => toggle(p, e.target.checked)} />
            {PARAMETER_LABELS[p]}
          </label>
        ))}
      </fieldset>
      <fieldset className="fit-window">
        <legend>Potential window</legend>
        <div className="field-grid two">
          <NumberField label="From" unit={`V vs ${scale.name}`} value={shown?.[0] ?? null} allowEmpty placeholder="whole cycle" testId="fit-window-from" onCommit={(v) => setEnd(0, v)} />
          <NumberField label="To" unit={`V vs ${scale.name}`} value={shown?.[1] ?? null} allowEmpty placeholder="whole cycle" testId="fit-window-to" onCommit={(v) => setEnd(1, v)} />
        </div>
        <button type="button" data-testid="fit-window-clear" disabled={!setup.windowV} onClick={() => change({ windowV: null })}>Whole cycle</button>
        <p className="hint">Or drag across the plot with “Set window” chosen.</p>
      </fieldset>
      <SelectField label={`Compare with${fileCount < 2 ? ' (one file: weak evidence)' : ''}`} value={setup.compare} options={COMPARISONS[setup.mechanism]} testId="fit-compare"
        onChange={(c) => change({ compare: c })} />
      <div className="buttons">
        <button type="submit" className="primary" data-testid="fit-run" disabled={running || setup.free.length === 0}>Fit</button>
        {running ? <button type="button" data-testid="fit-cancel" onClick={() => act.cancelFit(group)}>Cancel</button> : null}
      </div>
      <FitProgress group={group} />
    </form>
  );
}
