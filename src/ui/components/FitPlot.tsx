/** The series' files with the fitted curves over them and the residuals below; a drag can set the window. */
import { useMemo, useState } from 'react';
import type { DisplayScale } from '../../state/display';
import { fitFilesOf } from '../../state/fitRequest';
import { analysedCurrentOf } from '../../run/runInput';
import { halfwaveActions, useHalfwave, useHalfwaveShallow } from '../../state/react';
import type { FitSetup } from '../../state/types';
import { buildFitFigure } from '../plots/fitFigure';
import { PlotlyChart } from './PlotlyChart';

export function FitPlot({ group, setup, scale }: { group: string; setup: FitSetup; scale: DisplayScale }) {
  const [dragMode, setDragMode] = useState<'zoom' | 'window'>('zoom');
  const entry = useHalfwave((s) => s.fits[group]);
  const result = entry?.status === 'ready' ? entry.result : null;
  // With a result, the files it was fitted to and its scale; before, the series as it is now.
  const currentIds = useHalfwaveShallow((s) => fitFilesOf(s, group).ids);
  const ids = result && entry ? entry.fileIds : currentIds;
  const measurements = useHalfwaveShallow((s) => ids.map((id) => s.files[id]?.measurement ?? null));
  // The currents the fit saw: less each file's blank, as fitRequest.ts sends them.
  const currents = useHalfwaveShallow((s) => ids.map((id) => analysedCurrentOf(s, id)?.currentA ?? null));
  const convention = useHalfwave((s) => s.convention);
  const offsetV = result && entry ? entry.scale.offsetV : scale.offsetV;
  const scaleName = result && entry ? entry.scale.name : scale.name;
  const [lo, hi] = setup.windowV ?? [null, null];
  const cycle = (result && entry ? entry.setup.cycle : setup.cycle) ?? 1;
  const fig = useMemo(() => {
    const files = measurements.flatMap((m, k) => (m ? [{ name: m.fileName, scanRateVPerS: m.scanRateVPerS, potentialV: m.potentialV, currentA: currents[k] ?? m.currentA, cycles: m.cycles }] : []));
    const model = result && files.length === result.records.length ? result.records : null;
    const windowV: [number, number] | null = lo === null || hi === null ? null : [lo + offsetV, hi + offsetV];
    return buildFitFigure({ files, model, offsetV, scaleName, convention, windowV, dragMode, cycle });
  }, [measurements, currents, result, offsetV, scaleName, convention, lo, hi, dragMode, cycle]);
  const act = halfwaveActions();
  const onRange = (a: number, b: number) => act.setFitSetup(group, { windowV: [Math.min(a, b) - offsetV, Math.max(a, b) - offsetV] });
  return (
    <div className="fit-plot">
      <div className="group segmented" role="radiogroup" aria-label="Drag on the plot">
        <span className="group-label">Drag</span>
        <button type="button" role="radio" aria-checked={dragMode === 'zoom'} onClick={() => setDragMode('zoom')}>Zoom</button>
        <button type="button" role="radio" aria-checked={dragMode === 'window'} data-testid="fit-drag-window" onClick={() => setDragMode('window')}>Set window</button>
        <span className="hint">pale: measured · thin: fitted · below: measured − fitted</span>
      </div>
      <PlotlyChart data={fig.data} layout={fig.layout} testId="fit-plot" label="Measured and fitted voltammograms of the series, with residuals" {...(dragMode === 'window' ? { onRangeSelect: onRange } : {})} />
    </div>
  );
}
