import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { crashAnalysisWorkers, startApp } from '../state/app';
import { preloadPlotly } from './plotlyLoader';
import { App } from './App';
import './styles.css';

const root = document.getElementById('root');
if (root) {
  // Plotly (1 MB) evaluates on the page's thread for half a second or more: load it at once, so
  // that this happens while the workers start and the demo or the saved workspace is fetched,
  // not later, when it would hold up the answers of the first files and the sending of the next.
  preloadPlotly();
  createRoot(root).render(
    <StrictMode>
      <App />
    </StrictMode>,
  );
  void startApp();
  // The browser tests stop the workers mid-run to check that the work resumes; only with ?test-hooks.
  if (new URLSearchParams(location.search).has('test-hooks')) (window as unknown as { halfwaveTestHooks: unknown }).halfwaveTestHooks = { crashAnalysisWorkers };
}
