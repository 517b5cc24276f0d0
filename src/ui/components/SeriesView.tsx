/**
 * "Series": the chosen group's scan-rate study: every file overlaid (coloured by scan rate, in
 * the chosen scaling and cycle), the three diagnostic plots with the fits and their 95 % bands,
 * and the numbers behind them. Each figure can be saved as PNG or SVG.
 */
import { useEffect, useMemo, useState } from 'react';
import { halfwaveActions, useHalfwave, useHalfwaveShallow } from '../../state/react';
import { analysedCurrentOf } from '../../run/runInput';
import type { OverlayNormalisation } from '../../state/types';
import { safeName } from '../download';
import { fixed } from '../format';
import { buildOverlayFigure, type OverlayFile } from '../plots/overlayFigure';
import { buildSeriesFigures } from '../plots/seriesFigures';
import { CellSummary } from './CellSummary';
import { FigureExportButtons } from './FigureExportButtons';
import { PlotlyChart } from './PlotlyChart';
import { SeriesHeadline } from './SeriesHeadline';
import { SeriesPicker, useShownSeries } from './SeriesPicker';
import { SeriesTable } from './SeriesTable';
import { useSeriesCell, useSeriesScale } from './useSeriesCell';

const SCALINGS: { id: OverlayNormalisation; label: string }[] = [
  { id: 'current', label: 'i' }, { id: 'density', label: 'i/A (density)' }, { id: 'diffusion', label: 'i/v½ (diffusion)' }, { id: 'capacitive', label: 'i/v (capacitive)' },
];

type FigureId = 'overlay' | 'current' | 'logLog' | 'peakPotential';

export function SeriesView() {
  const { groups, group } = useShownSeries();
  const entry = useHalfwave((s) => (group ? s.series[group] : undefined));
  const overlay = useHalfwave((s) => s.seriesOverlay);
  const convention = useHalfwave((s) => s.convention);
  const scale = useSeriesScale(group);
  const area = useSeriesCell(group).cell.areaCm2;
  const [coupleIndex, setCoupleIndex] = useState(0);
  const [exported, setExported] = useState<FigureId>('overlay');
  const act = halfwaveActions();
  useEffect(() => {
    if (group && !entry) void act.analyzeGroup(group);
  }, [group, entry, act]);
  const couples = entry?.result?.analysis.couples ?? [];
  const couple = couples[coupleIndex] ?? couples[0];
  const figs = useMemo(() => (couple ? buildSeriesFigures(couple, scale.name) : null), [couple, scale]);
  const overlayFiles = useOverlayFiles(group);
  const cycles = Math.max(1, ...overlayFiles.map((f) => f.cycles.length));
  const overlayFig = useMemo(() => buildOverlayFigure({
    files: overlayFiles, normalisation: overlay.normalisation, cycle: overlay.cycle, areaCm2: area, convention,
    potentialAxisTitle: `E vs ${scale.name} / V`,
  }), [overlayFiles, overlay, area, convention, scale.name]);
  const all = { overlay: overlayFig, current: figs?.current ?? null, logLog: figs?.logLog ?? null, peakPotential: figs?.peakPotential ?? null };

  return (
    <section className="panel series" aria-labelledby="series-title" data-testid="series-view">
      <div className="toolbar">
        <h2 id="series-title">Scan-rate series</h2>
        <SeriesPicker groups={groups} group={group} testId="series-group" onPick={() => setCoupleIndex(0)} />
        {couples.length > 1 ? (
          <label>
            Couple{' '}
            <select value={coupleIndex} onChange={(e) => setCoupleIndex(Number(e.target.value))}>
              {couples.map((c, k) => <option key={k} value={k}>{k + 1}{c.eHalfV !== null ? ` (E½ ${fixed(c.eHalfV, 3)} V)` : ''}</option>)}
            </select>
          </label>
        ) : null}
        <label>
          Figure{' '}
          <select value={exported} data-testid="series-figure" onChange={(e) => setExported(e.target.value as FigureId)}>
            <option value="overlay">overlay</option><option value="current">|ip| against v½</option>
            <option value="logLog">log|ip| against log v</option><option value="peakPotential">Ep against log v</option>
          </select>
        </label>
        <FigureExportButtons figure={all[exported]} baseName={`halfwave-${safeName(group ?? 'series')}-${exported}`} what={`the ${exported} plot`} testId="series-figure" />
        <span className="status" role="status">{entry?.status === 'running' ? 'fitting…' : entry ? `${entry.fileIds.length} files` : ''}</span>
      </div>
      {group ? <CellSummary group={group} /> : null}
      {group ? <SeriesHeadline group={group} /> : null}
      {entry?.error ? <p className="error-text" role="alert">{entry.error.message}</p> : null}
      <div className="overlay-bar toolbar" role="group" aria-label="Overlay of the series">
        <label>
          Scale currents as{' '}
          <select value={overlay.normalisation} data-testid="overlay-scaling" onChange={(e) => act.setView({ seriesOverlay: { ...halfwaveActions().seriesOverlay, normalisation: e.target.value as OverlayNormalisation } })}>
            {SCALINGS.map((s) => <option key={s.id} value={s.id}>{s.label}</option>)}
          </select>
        </label>
        <label>
          Cycle{' '}
          <select value={overlay.cycle} data-testid="overlay-cycle" onChange={(e) => act.setView({ seriesOverlay: { ...halfwaveActions().seriesOverlay, cycle: Number(e.target.value) } })}>
            {Array.from({ length: cycles }, (_, k) => <option key={k} value={k + 1}>{k + 1}</option>)}
          </select>
        </label>
        {overlay.normalisation === 'density' && area === null ? <span className="warn-text">give the electrode area in the Cell panel</span> : null}
      </div>
      <div className="series-plots">
        <PlotlyChart data={overlayFig.data} layout={overlayFig.layout} testId="series-overlay-plot" label="Every voltammogram of the series, coloured by scan rate" />
        {figs ? (
          <>
            <PlotlyChart data={figs.current.data} layout={figs.current.layout} testId="series-current-plot" label="Peak current against scan rate" />
            <PlotlyChart data={figs.logLog.data} layout={figs.logLog.layout} testId="series-loglog-plot" label="log peak current against log scan rate" />
            <PlotlyChart data={figs.peakPotential.data} layout={figs.peakPotential.layout} testId="series-ep-plot" label="Peak potential against log scan rate" />
          </>
        ) : (
          <p className="empty">{entry?.status === 'ready' ? 'No couple could be followed across the scan rates of this group.' : 'Waiting for the analyses of this group…'}</p>
        )}
      </div>
      {entry?.result ? <SeriesTable result={entry.result} /> : null}
    </section>
  );
}

/** The series' files as drawn: analysed potentials on the display scale, currents as analysed (less a blank). */
function useOverlayFiles(group: string | null): OverlayFile[] {
  const fileOrder = useHalfwave((s) => s.fileOrder);
  const files = useHalfwave((s) => s.files);
  const results = useHalfwave((s) => s.results);
  const currents = useHalfwaveShallow((s) => Object.fromEntries(s.fileOrder.flatMap((id) => (s.files[id]?.group === group ? [[id, analysedCurrentOf(s, id)?.currentA ?? null]] : []))));
  return useMemo(() => fileOrder.flatMap((id) => {
    const f = files[id];
    const run = results[id]?.run;
    const m = f?.measurement;
    if (!f || f.group !== group || !m || !run || !m.scanRateVPerS) return [];
    const potentialV = run.analysedPotentialV ?? (run.reference.offsetV === 0 ? m.potentialV : m.potentialV.map((e) => e + run.reference.offsetV));
    return [{ name: f.fileName, scanRateVPerS: m.scanRateVPerS, potentialV, currentA: currents[id] ?? m.currentA, cycles: m.cycles }];
  }), [fileOrder, files, results, group, currents]);
}
