import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { crashAnalysisWorkers, getAppStore, startApp } from '../state/app';
import { preloadPlotly } from './plotlyLoader';
import { App } from './App';
import './styles.css';

/**
 * Plotly (1 MB) parses on the page's thread: start it once the first files are on their way to
 * the workers, so its parse overlaps their reading instead of delaying it.
 */
function preloadPlotlyOnceFilesQueued(): void {
  const store = getAppStore();
  const stop = store.subscribe((s) => {
    if (s.fileOrder.length === 0) return;
    stop();
    preloadPlotly();
  });
  // Nothing to load (no demo data): fetch it anyway, a little later.
  setTimeout(() => {
    stop();
    preloadPlotly();
  }, 3000);
}

const root = document.getElementById('root');
if (root) {
  createRoot(root).render(
    <StrictMode>
      <App />
    </StrictMode>,
  );
  preloadPlotlyOnceFilesQueued();
  void startApp();
  // The browser tests stop the workers mid-run to check that the work resumes; only with ?test-hooks.
  if (new URLSearchParams(location.search).has('test-hooks')) (window as unknown as { halfwaveTestHooks: unknown }).halfwaveTestHooks = { crashAnalysisWorkers };
}
