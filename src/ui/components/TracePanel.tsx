/** "Trace": the selected voltammogram with peaks, baselines and (optionally) the smoothed curve. */
import { useEffect, useMemo } from 'react';
import { halfwaveActions, useHalfwave, useHalfwaveShallow } from '../../state/react';
import { analysedCurrentOf } from '../../run/runInput';
import { buildTraceFigure } from '../plots/traceFigure';
import { PlotlyChart } from './PlotlyChart';
import { TraceToolbar } from './TraceToolbar';
import { useSeriesCell, useSeriesScale } from './useSeriesCell';
import { useWorkingWindow } from './useWorkingWindow';

export function TracePanel() {
  const id = useHalfwave((s) => s.selectedFileId);
  const file = useHalfwave((s) => (id ? s.files[id] : undefined));
  const result = useHalfwave((s) => (id ? s.results[id] : undefined));
  const windows = useHalfwave((s) => (id ? s.fileSettings[id]?.peakWindows : undefined));
  const settings = useHalfwave((s) => s.settings);
  const view = useHalfwaveShallow((s) => ({ cycle: s.selectedCycle, convention: s.convention, showSmoothed: s.showSmoothed, showBaselines: s.showBaselines, dragMode: s.dragMode, dir: s.windowDirection }));
  const scale = useSeriesScale(file?.group ?? null);
  const working = useWorkingWindow(file?.group ?? null);
  const cell = useSeriesCell(file?.group ?? null);
  const showTheory = useHalfwave((s) => s.showTheory);
  const theory = useHalfwave((s) => (id ? s.theory[id] : undefined));
  const seriesResult = useHalfwave((s) => (file ? s.series[file.group]?.result : undefined));
  useEffect(() => {
    if (showTheory && id && seriesResult) void halfwaveActions().simulateTheory(id);
  }, [showTheory, id, seriesResult, settings, cell]);
  const companions = useHalfwaveShallow((s) => {
    if (!s.showCompanions || !file) return [];
    return s.fileOrder.filter((f) => f !== id && s.files[f]?.group === file.group && s.files[f]?.measurement).slice(0, 12)
      .map((f) => s.files[f]?.measurement as NonNullable<typeof m>);
  });
  const theoryCurve = showTheory && theory?.curve ? { ...theory.curve, label: 'theory (simulated, fitted values)' } : null;
  const m = file?.measurement ?? null;
  const run = result?.run ?? null;
  // The current the picks were made on: less the file's blank when it has one.
  const analysed = useHalfwaveShallow((s) => (id ? analysedCurrentOf(s, id) : null) ?? { currentA: null, blank: null });
  // Until the analysis is back, the recorded potentials are shifted by the series' display offset.
  const offsetV = run?.reference.offsetV ?? scale.offsetV;
  const shown = useMemo(() => (!m ? null : run?.analysedPotentialV ?? (offsetV === 0 || run ? m.potentialV : m.potentialV.map((e) => e + offsetV))), [m, run, offsetV]);
  const iRCorrected = (run?.warnings ?? []).some((w) => w.code === 'OHMIC');

  const figure = useMemo(() => {
    if (!m || !shown) return null;
    return buildTraceFigure({
      fileName: m.fileName, potentialV: shown, currentA: analysed.currentA ?? m.currentA, cycles: m.cycles,
      blank: analysed.blank ? { name: analysed.blank, recordedA: m.currentA } : null,
      analysis: run?.analysis ?? null, cycle: view.cycle, convention: view.convention,
      showSmoothed: view.showSmoothed, showBaselines: view.showBaselines, dragMode: view.dragMode,
      peakWindows: windows ?? [], recordingOffsetV: offsetV,
      potentialAxisTitle: `E${iRCorrected ? ' (iR-corrected)' : ''} vs ${scale.name} / V`, currentKind: m.currentKind,
      theory: theoryCurve,
      companions: companions.map((c) => ({ name: c.fileName, potentialV: c.potentialV, currentA: c.currentA, cycles: c.cycles })),
      workingWindow: working && (working.lowerV !== null || working.upperV !== null)
        ? { lowerV: working.lowerV, upperV: working.upperV, lowerLabel: working.entry.lower?.process ?? 'limit', upperLabel: working.entry.upper?.process ?? 'limit' }
        : null,
    });
  }, [m, shown, run, iRCorrected, offsetV, view, windows, scale, theoryCurve?.currentA, companions, working, analysed.currentA, analysed.blank]);

  const onRangeSelect = (a: number, b: number) => {
    if (!id || view.dragMode !== 'window') return;
    // Windows are kept on the file's recording scale (so they survive a change of display scale).
    const fromV = Math.min(a, b) - offsetV;
    const toV = Math.max(a, b) - offsetV;
    void halfwaveActions().updateFileSettings(id, (fs) => ({ ...fs, peakWindows: [...fs.peakWindows, { direction: view.dir, fromV, toV }] }));
  };

  return (
    <section className="panel trace" aria-labelledby="trace-title">
      <h2 id="trace-title" className="visually-hidden">Trace</h2>
      <TraceToolbar cycles={m?.cycles.map((c) => c.index) ?? []} status={result?.status ?? null} figure={figure} fileName={m?.fileName ?? 'trace'} />
      {figure ? (
        <PlotlyChart data={figure.data} layout={figure.layout} testId="trace-plot" label={`Voltammogram of ${m?.fileName ?? ''}`} onRangeSelect={onRangeSelect} />
      ) : (
        <p className="empty plot-empty">Load or select a file to see its voltammogram.</p>
      )}
      {result?.error ? <p className="error-text" role="alert">Analysis failed: {result.error.message}</p> : null}
      {!scale.ok ? <p className="warn-text">{scale.basis}</p> : null}
      {showTheory && theory ? (
        <p className={theory.error ? 'warn-text' : 'hint'} data-testid="theory-note">
          {theory.error ? theory.error.message : `Theory overlay, ${theory.description}.`}
        </p>
      ) : null}
    </section>
  );
}
