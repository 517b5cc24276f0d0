/** Title bar: undo/redo, current sign convention, view switch, sessions, export, safety. */
import { useRef } from 'react';
import { loadSession, saveSession } from '../../state/commands';
import { halfwaveActions, useHalfwave } from '../../state/react';
import { downloadText, stamp } from '../download';

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
        <button type="button" disabled={!canUndo} data-testid="undo" onClick={() => void act.undo()} title="Undo the last settings change">Undo</button>
        <button type="button" disabled={!canRedo} data-testid="redo" onClick={() => void act.redo()}>Redo</button>
      </div>
      <div className="group segmented" role="radiogroup" aria-label="Current sign convention">
        {(['iupac', 'polarographic'] as const).map((c) => (
          <button key={c} type="button" role="radio" aria-checked={convention === c} data-testid={`convention-${c}`}
            onClick={() => act.setView({ convention: c })}>
            {c === 'iupac' ? 'IUPAC: anodic up' : 'Polarographic: cathodic up'}
          </button>
        ))}
      </div>
      <div className="group segmented" role="radiogroup" aria-label="Main view">
        <button type="button" role="radio" aria-checked={mainView === 'trace'} data-testid="view-trace" onClick={() => act.setView({ mainView: 'trace' })}>Single trace</button>
        <button type="button" role="radio" aria-checked={mainView === 'series'} data-testid="view-series" onClick={() => act.setView({ mainView: 'series' })}>Scan-rate series</button>
      </div>
      <span className="spacer" />
      <div className="group" role="group" aria-label="Session">
        <button type="button" data-testid="save-session" onClick={() => void save(false)} title="Settings, file names and checksums">Save session</button>
        <button type="button" onClick={() => void save(true)} title="Also embeds the original files">…with data</button>
        <button type="button" onClick={() => sessionInput.current?.click()}>Open session…</button>
        <input ref={sessionInput} type="file" accept=".json,application/json" className="visually-hidden" data-testid="session-input" aria-label="Open a session file"
          onChange={(e) => {
            const f = e.target.files?.[0];
            e.target.value = '';
            if (f) void f.text().then(loadSession);
          }} />
      </div>
      <button type="button" className="safety-button" data-testid="safety-open" onClick={() => act.setView({ safetyOpen: true })}>Bench safety</button>
    </header>
  );
}
