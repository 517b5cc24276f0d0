import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { startApp } from '../state/app';
import { preloadPlotly } from './plotlyLoader';
import { App } from './App';
import './styles.css';

const root = document.getElementById('root');
if (root) {
  createRoot(root).render(
    <StrictMode>
      <App />
    </StrictMode>,
  );
  preloadPlotly();
  void startApp();
}
