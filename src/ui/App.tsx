/** Arranges the regions: intake (left), trace and readout (centre), method and cell (right). */
import { useHalfwave } from '../state/react';
import { CellPanel } from './components/CellPanel';
import { FitPanel } from './components/FitPanel';
import { IntakePanel } from './components/IntakePanel';
import { MethodPanel } from './components/MethodPanel';
import { NoticeBar } from './components/NoticeBar';
import { PanelBoundary } from './components/PanelBoundary';
import { ReadoutPanel } from './components/ReadoutPanel';
import { SeriesView } from './components/SeriesView';
import { SafetyDrawer } from './components/SafetyDrawer';
import { TopBar } from './components/TopBar';
import { TracePanel } from './components/TracePanel';
import { useUndoKeys } from './useUndoKeys';

export function App() {
  const mainView = useHalfwave((s) => s.mainView);
  useUndoKeys();
  return (
    <div className="app">
      <TopBar />
      <NoticeBar />
      <main className="workspace">
        <aside className="column left" aria-label="Files">
          <PanelBoundary name="intake"><IntakePanel /></PanelBoundary>
        </aside>
        <div className="column centre">
          {mainView === 'trace' ? (
            <>
              <PanelBoundary name="trace"><TracePanel /></PanelBoundary>
              <PanelBoundary name="readout"><ReadoutPanel /></PanelBoundary>
            </>
          ) : mainView === 'series' ? (
            <PanelBoundary name="series"><SeriesView /></PanelBoundary>
          ) : (
            <PanelBoundary name="fit"><FitPanel /></PanelBoundary>
          )}
        </div>
        <aside className="column right" aria-label="Analysis settings">
          <PanelBoundary name="method"><MethodPanel /></PanelBoundary>
          <PanelBoundary name="cell"><CellPanel /></PanelBoundary>
        </aside>
      </main>
      <SafetyDrawer />
    </div>
  );
}
