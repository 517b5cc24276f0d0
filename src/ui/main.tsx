import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { crashAnalysisWorkers, startApp } from '../state/app';
import { App } from './App';
import './styles.css';

const root = document.getElementById('root');
if (root) {
  createRoot(root).render(
    <StrictMode>
      <App />
    </StrictMode>,
  );
  void startApp();
  // The browser tests stop the workers mid-run to check that the work resumes; only with ?test-hooks.
  if (new URLSearchParams(location.search).has('test-hooks')) (window as unknown as { halfwaveTestHooks: unknown }).halfwaveTestHooks = { crashAnalysisWorkers };
}
