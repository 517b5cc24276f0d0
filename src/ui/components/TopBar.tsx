/** Title bar: undo/redo, current sign convention, view switch, sessions, export, safety. */
import { useRef } from 'react';
import { loadSession, saveSession } from '../../state/commands';
import { halfwaveActions, useHalfwave } from '../../state/react';
import { downloadText, stamp } from '../download';
import { ExportButtons } from './ExportButtons';

export function TopBar() {
  const canUndo = useHalfwave((s) => s.past.length > 0);
  const canRedo = useHalfwave((s) => s.future.length > 0);
  const convention = useHalfwave((s) => s.convention);
  const mainView = useHalfwave((s) => s.mainView);
  const sessionInput = useRef<HTMLInputElement>(null);
  const act = halfwaveActions();
  const save = async (raw: boolean) => downloadText(`halfwave-session-${stamp()}.json`, await saveSession(raw), 'application/json');
  return (
    <header className="topbar">
      <h1>Halfwave <span className="tagline">voltammetry workbench</span></h1>
      <div className="group" role="group" aria-label="Undo">
        <button type="button" disabled={!canUndo} data-testid="undo" onClick={() => void act.undo()} title="Undo the last settings change (Ctrl+Z)">Undo</button>
        <button type="button" disabled={!canRedo} data-testid="redo" onClick={() => void act.redo()} title="Redo (Ctrl+Shift+Z)">Redo</button>
      </div>
      <div className="group segmented" role="radiogroup" aria-label="Current sign convention">
        <span className="group-label">Current sign</span>
        {(['iupac', 'polarographic'] as const).map((c) => (
          <button key={c} type="button" role="radio" aria-checked={convention === c} data-testid={`convention-${c}`}
            title={c === 'iupac' ? 'anodic current up, potential increasing to the right' : 'cathodic current up, potential increasing to the left'}
            onClick={() => void act.setConvention(c)}>
            {c === 'iupac' ? 'IUPAC' : 'Polarographic'}
          </button>
        ))}
      </div>
      <div className="group segmented" role="radiogroup" aria-label="Main view">
        <span className="group-label">View</span>
        <button type="button" role="radio" aria-checked={mainView === 'trace'} data-testid="view-trace" onClick={() => act.setView({ mainView: 'trace' })}>Trace</button>
        <button type="button" role="radio" aria-checked={mainView === 'series'} data-testid="view-series" onClick={() => act.setView({ mainView: 'series' })}>Series</button>
        <button type="button" role="radio" aria-checked={mainView === 'fit'} data-testid="view-fit" onClick={() => act.setView({ mainView: 'fit' })} title="Fit simulated voltammograms to a whole series">Fit</button>
        <button type="button" role="radio" aria-checked={mainView === 'report'} data-testid="view-report" onClick={() => act.setView({ mainView: 'report' })}>Report</button>
      </div>
      <span className="spacer" />
      <ExportButtons />
      <div className="group" role="group" aria-label="Session">
        <span className="group-label">Session</span>
        <button type="button" data-testid="save-session" onClick={() => void save(false)} title="Settings, file names and checksums">Save</button>
        <button type="button" data-testid="save-session-data" onClick={() => void save(true)} title="Also embeds the original files">Save + data</button>
        <button type="button" onClick={() => sessionInput.current?.click()} title="Replaces the workspace with the session (Undo brings it back)">Open…</button>
        <button type="button" data-testid="new-workspace" onClick={() => act.newWorkspace()} title="Clears every file and series (Undo brings them back)">New</button>
        <input ref={sessionInput} type="file" accept=".json,application/json" className="visually-hidden" data-testid="session-input" aria-label="Open a session file"
          onChange={(e) => {
            const f = e.target.files?.[0];
            e.target.value = '';
            if (f) void loadSession(f);
          }} />
      </div>
      <button type="button" className="safety-button" data-testid="safety-open" onClick={() => act.setView({ safetyOpen: true })}>Bench safety</button>
    </header>
  );
}
