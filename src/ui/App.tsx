/** Arranges the regions: intake (left), trace and readout, series or report (centre), settings (right). */
import { useHalfwave } from '../state/react';
import { CellPanel } from './components/CellPanel';
import { FitPanel } from './components/FitPanel';
import { IntakePanel } from './components/IntakePanel';
import { NoticeBar } from './components/NoticeBar';
import { PanelBoundary } from './components/PanelBoundary';
import { PeakFindingPanel } from './components/PeakFindingPanel';
import { ReadoutPanel } from './components/ReadoutPanel';
import { ReportView } from './components/ReportView';
import { SeriesView } from './components/SeriesView';
import { SafetyDrawer } from './components/SafetyDrawer';
import { TopBar } from './components/TopBar';
import { TracePanel } from './components/TracePanel';
import { WorkingWindowPanel } from './components/WorkingWindowPanel';
import { useUndoKeys } from './useUndoKeys';

export function App() {
  const mainView = useHalfwave((s) => s.mainView);
  const drawerOpen = useHalfwave((s) => s.safetyOpen);
  useUndoKeys();
  return (
    <div className={`app view-${mainView}`}>
      <a className="skip-link" href="#main-view" data-testid="skip-link">Skip to the plot</a>
      <div className="app-body" inert={drawerOpen}>
        <TopBar />
        <NoticeBar />
        <main className="workspace">
          <aside className="column left" aria-label="Files">
            <PanelBoundary name="intake"><IntakePanel /></PanelBoundary>
          </aside>
          <div className="column centre" id="main-view" tabIndex={-1}>
            {mainView === 'trace' ? (
              <>
                <PanelBoundary name="trace"><TracePanel /></PanelBoundary>
                <PanelBoundary name="readout"><ReadoutPanel /></PanelBoundary>
              </>
            ) : mainView === 'series' ? (
              <PanelBoundary name="series"><SeriesView /></PanelBoundary>
            ) : mainView === 'fit' ? (
              <PanelBoundary name="fit"><FitPanel /></PanelBoundary>
            ) : (
              <PanelBoundary name="report"><ReportView /></PanelBoundary>
            )}
          </div>
          <aside className="column right" aria-label="Analysis settings">
            <PanelBoundary name="peak finding"><PeakFindingPanel /></PanelBoundary>
            <PanelBoundary name="cell"><CellPanel /></PanelBoundary>
            <PanelBoundary name="working window"><WorkingWindowPanel /></PanelBoundary>
          </aside>
        </main>
      </div>
      <SafetyDrawer />
    </div>
  );
}
