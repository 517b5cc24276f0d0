/** Arranges the regions: intake (left), trace and readout (centre), method and cell (right). */
import { useHalfwave } from '../state/react';
import { CellPanel } from './components/CellPanel';
import { IntakePanel } from './components/IntakePanel';
import { MethodPanel } from './components/MethodPanel';
import { NoticeBar } from './components/NoticeBar';
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
          <IntakePanel />
        </aside>
        <div className="column centre">
          {mainView === 'trace' ? (
            <>
              <TracePanel />
              <ReadoutPanel />
            </>
          ) : (
            <SeriesView />
          )}
        </div>
        <aside className="column right" aria-label="Analysis settings">
          <MethodPanel />
          <CellPanel />
        </aside>
      </main>
      <SafetyDrawer />
    </div>
  );
}
