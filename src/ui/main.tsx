// First: it starts reading the demo file while the modules below are evaluated.
import { demoReading } from './earlyStart';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { crashAnalysisWorkers, getAppStore, startApp } from '../state/app';
import { preloadPlotly } from './plotlyLoader';
import { App } from './App';
import './styles.css';

/**
 * The longest the first render waits for the first files to be sent (ms): a workspace restored
 * from a slow storage must not leave the page on its start-up line.
 */
const RENDER_AT_LATEST_MS = 800;

const root = document.getElementById('root');
if (root) {
  const store = getAppStore();
  // The start is ordered for the page's one thread, which also hands the files to the workers:
  // 1. the demo or the saved workspace is read and its files are sent to the workers;
  // 2. then the page is rendered (its first layout takes a quarter of a second), and Plotly
  //    (1 MB, fetched and compiled meanwhile through a preload link) is run, which takes half a
  //    second; both happen while the workers read and analyse the files.
  // Done the other way round, the files would wait for both.
  let started = false;
  const renderAndLoadPlots = () => {
    if (started) return;
    started = true;
    stopWatching();
    clearTimeout(atLatest);
    createRoot(root).render(
      <StrictMode>
        <App />
      </StrictMode>,
    );
    preloadPlotly();
  };
  const stopWatching = store.subscribe((s) => {
    if (s.fileOrder.length === 0) return;
    stopWatching();
    // A new task, so that the request messages of the files just added go out first.
    setTimeout(renderAndLoadPlots, 0);
  });
  const atLatest = setTimeout(renderAndLoadPlots, RENDER_AT_LATEST_MS);
  void startApp(store, undefined, () => demoReading).finally(renderAndLoadPlots);
  // The browser tests stop the workers mid-run to check that the work resumes; only with ?test-hooks.
  if (new URLSearchParams(location.search).has('test-hooks')) (window as unknown as { halfwaveTestHooks: unknown }).halfwaveTestHooks = { crashAnalysisWorkers };
}
