/**
 * "Fit": the whole-curve fit of one scan-rate series. The setup on the left (mechanism, free
 * parameters, window, comparison), the measured and fitted curves of every file with the residuals
 * on the right, then the parameters with their errors and what the data say of them, the strongest
 * correlations, the model-choice advice and "use these values". The fit runs in a worker.
 */
import { useMemo } from 'react';
import type { FitSetup } from '../../state/types';
import { useHalfwave } from '../../state/react';
import '../fit.css';
import { FitPlot } from './FitPlot';
import { FitResults } from './FitResults';
import { FitSetupForm } from './FitSetupForm';
import { SeriesPicker, useShownSeries } from './SeriesPicker';
import { useSeriesScale } from './useSeriesCell';

export function FitPanel() {
  const { groups, group } = useShownSeries();
  const status = useHalfwave((s) => (group ? s.fits[group]?.status : undefined));
  return (
    <section className="panel fit" aria-labelledby="fit-title" data-testid="fit-view">
      <div className="toolbar">
        <h2 id="fit-title">Whole-curve fit</h2>
        <SeriesPicker groups={groups} group={group} testId="fit-group" />
        <span className="status" role="status" data-testid="fit-status">{statusText(status)}</span>
      </div>
      {group ? <FitSeries key={group} group={group} /> : <p className="empty">Load the voltammograms of a scan-rate series to fit them.</p>}
    </section>
  );
}

function statusText(status: string | undefined): string {
  switch (status) {
    case 'running': return 'fitting…';
    case 'ready': return 'fitted';
    case 'cancelled': return 'cancelled';
    case 'error': return 'the fit failed';
    default: return 'not fitted yet';
  }
}

function FitSeries({ group }: { group: string }) {
  // As JSON text: the default setup is built afresh on every read, and a selector must return a stable value.
  const setupJson = useHalfwave((s) => JSON.stringify(s.fitSetupOf(group)));
  const setup = useMemo(() => JSON.parse(setupJson) as FitSetup, [setupJson]);
  const scale = useSeriesScale(group);
  const error = useHalfwave((s) => s.fits[group]?.error ?? null);
  return (
    <>
      <div className="fit-top">
        <FitSetupForm group={group} setup={setup} scale={scale} />
        <FitPlot group={group} setup={setup} scale={scale} />
      </div>
      {error ? <p className="error-text" role="alert" data-testid="fit-error">{error.message}</p> : null}
      <FitResults group={group} />
    </>
  );
}
