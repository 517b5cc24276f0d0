/** "Readout": tabbed tables under the trace. Arrow keys move between tabs (WAI-ARIA tabs pattern). */
import type { KeyboardEvent } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';
import type { ReadoutTab } from '../../state/types';
import { CouplesTable } from './CouplesTable';
import { ImportDecisions } from './ImportDecisions';
import { NotesList } from './NotesList';
import { PeaksTable } from './PeaksTable';
import { ResultsTable } from './ResultsTable';

const TABS: { id: ReadoutTab; label: string; body: () => React.JSX.Element }[] = [
  { id: 'couples', label: 'Couples', body: CouplesTable },
  { id: 'files', label: 'Across files', body: ResultsTable },
  { id: 'peaks', label: 'Peaks', body: PeaksTable },
  { id: 'import', label: 'How the file was read', body: ImportDecisions },
  { id: 'notes', label: 'Notes', body: NotesList },
];

export function ReadoutPanel() {
  const tab = useHalfwave((s) => s.readoutTab);
  const setTab = (t: ReadoutTab) => halfwaveActions().setView({ readoutTab: t });
  const onKey = (e: KeyboardEvent) => {
    const k = TABS.findIndex((t) => t.id === tab);
    const step = e.key === 'ArrowRight' ? 1 : e.key === 'ArrowLeft' ? -1 : 0;
    if (step === 0) return;
    const next = TABS[(k + step + TABS.length) % TABS.length];
    if (next) {
      setTab(next.id);
      document.getElementById(`tab-${next.id}`)?.focus();
    }
  };
  const active = TABS.find((t) => t.id === tab) ?? TABS[0];
  if (!active) return null;
  const Body = active.body;
  return (
    <section className="panel readout" aria-label="Readout">
      <div role="tablist" aria-label="Readout tables" className="tabs" onKeyDown={onKey}>
        {TABS.map((t) => (
          <button key={t.id} id={`tab-${t.id}`} role="tab" type="button" aria-selected={t.id === tab} aria-controls={`panel-${t.id}`}
            tabIndex={t.id === tab ? 0 : -1} data-testid={`tab-${t.id}`} onClick={() => setTab(t.id)}>
            {t.label}
          </button>
        ))}
      </div>
      <div role="tabpanel" id={`panel-${active.id}`} aria-labelledby={`tab-${active.id}`} className="tab-body">
        <Body />
      </div>
    </section>
  );
}
