/** "Series": the chosen group's scan-rate study: three plots and the numbers behind them. */
import { useEffect, useMemo, useState } from 'react';
import { halfwaveActions, useHalfwave, useHalfwaveShallow } from '../../state/react';
import { buildSeriesFigures } from '../plots/seriesFigures';
import { PlotlyChart } from './PlotlyChart';
import { SeriesTable } from './SeriesTable';
import { CellSummary } from './CellSummary';
import { useSeriesScale } from './useSeriesCell';

export function SeriesView() {
  const groups = useHalfwaveShallow((s) => s.groups());
  const chosen = useHalfwave((s) => s.selectedGroup);
  const group = chosen && groups.includes(chosen) ? chosen : (groups[0] ?? null);
  const entry = useHalfwave((s) => (group ? s.series[group] : undefined));
  const scale = useSeriesScale(group);
  const [coupleIndex, setCoupleIndex] = useState(0);
  const act = halfwaveActions();
  useEffect(() => {
    if (group && !entry) void act.analyzeGroup(group);
  }, [group, entry, act]);
  const couples = entry?.result?.analysis.couples ?? [];
  const couple = couples[coupleIndex] ?? couples[0];
  const figs = useMemo(() => (couple ? buildSeriesFigures(couple, scale.name) : null), [couple, scale]);

  return (
    <section className="panel series" aria-labelledby="series-title" data-testid="series-view">
      <div className="toolbar">
        <h2 id="series-title">Scan-rate series</h2>
        <label>
          Series{' '}
          <select value={group ?? ''} data-testid="series-group" onChange={(e) => { setCoupleIndex(0); act.selectGroup(e.target.value); }}>
            {groups.map((g) => <option key={g} value={g}>{g}</option>)}
          </select>
        </label>
        {couples.length > 1 ? (
          <label>
            Couple{' '}
            <select value={coupleIndex} onChange={(e) => setCoupleIndex(Number(e.target.value))}>
              {couples.map((c, k) => <option key={k} value={k}>{k + 1}{c.eHalfV !== null ? ` (E½ ${c.eHalfV.toFixed(3)} V)` : ''}</option>)}
            </select>
          </label>
        ) : null}
        <span className="status" role="status">{entry?.status === 'running' ? 'fitting…' : entry ? `${entry.fileIds.length} files` : ''}</span>
      </div>
      {group ? <CellSummary group={group} /> : null}
      {entry?.error ? <p className="error-text" role="alert">{entry.error.message}</p> : null}
      {figs ? (
        <div className="series-plots">
          <PlotlyChart data={figs.current.data} layout={figs.current.layout} testId="series-current-plot" label="Peak current against scan rate" />
          <PlotlyChart data={figs.logLog.data} layout={figs.logLog.layout} testId="series-loglog-plot" label="log peak current against log scan rate" />
          <PlotlyChart data={figs.peakPotential.data} layout={figs.peakPotential.layout} testId="series-ep-plot" label="Peak potential against log scan rate" />
        </div>
      ) : (
        <p className="empty">{entry?.status === 'ready' ? 'No couple could be followed across the scan rates of this group.' : 'Waiting for the analyses of this group…'}</p>
      )}
      {entry?.result ? <SeriesTable result={entry.result.analysis} /> : null}
    </section>
  );
}
