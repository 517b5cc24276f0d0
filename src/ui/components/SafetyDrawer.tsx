/**
 * Short bench-safety note and what the app is; defers to local rules and the safety officer. A
 * modal drawer: focus moves into it, Tab and Shift+Tab stay inside it, Escape (or Close) shuts it
 * and gives focus back to the control that opened it.
 */
import { useEffect, useRef, type KeyboardEvent } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';

export function SafetyDrawer() {
  const open = useHalfwave((s) => s.safetyOpen);
  const drawer = useRef<HTMLElement>(null);
  const close = useRef<HTMLButtonElement>(null);
  const opener = useRef<Element | null>(null);
  useEffect(() => {
    if (!open) return undefined;
    opener.current = document.activeElement;
    close.current?.focus();
    return () => {
      const back = opener.current as HTMLElement | null;
      if (back && document.contains(back)) back.focus();
    };
  }, [open]);
  if (!open) return null;
  const hide = () => halfwaveActions().setView({ safetyOpen: false });
  const onKey = (e: KeyboardEvent) => {
    if (e.key === 'Escape') {
      e.preventDefault();
      hide();
      return;
    }
    if (e.key !== 'Tab' || !drawer.current) return;
    const focusable = [...drawer.current.querySelectorAll<HTMLElement>('button, a[href], [tabindex="0"]')];
    const first = focusable[0];
    const last = focusable[focusable.length - 1];
    if (e.shiftKey && document.activeElement === first) {
      e.preventDefault();
      last?.focus();
    } else if (!e.shiftKey && document.activeElement === last) {
      e.preventDefault();
      first?.focus();
    }
  };
  return (
    <>
      <div className="drawer-backdrop" aria-hidden="true" onClick={hide} />
      <aside ref={drawer} className="drawer" role="dialog" aria-modal="true" aria-labelledby="safety-title" data-testid="safety-drawer" onKeyDown={onKey}>
        <h2 id="safety-title">Bench safety</h2>
        <ul>
          <li><strong>Mercury.</strong> Calomel (SCE, Hg/Hg₂Cl₂), mercury/mercurous-sulfate (Hg/Hg₂SO₄) and Hg/HgO reference electrodes contain mercury. Do not open or heat them; a broken electrode is a mercury spill — use the spill kit and procedure your lab prescribes.</li>
          <li><strong>Hydrogen.</strong> Sweeping to strongly negative potentials in protic or aqueous media evolves hydrogen gas. Keep cells ventilated and away from ignition sources, especially with flammable solvents.</li>
          <li><strong>Solvents and salts.</strong> Acetonitrile, DMF, dichloromethane and similar solvents are flammable and/or toxic; perchlorate salts can be explosive with organics. Work in a fume hood with the protective equipment your safety data sheets require.</li>
          <li><strong>Waste.</strong> Dispose of electrolyte, mercury-containing parts and electrode polishing slurries according to your local rules.</li>
        </ul>
        <p>These notes are reminders, not a risk assessment. Your lab's safety officer and local regulations take precedence.</p>
        <h3>About this tool</h3>
        <p>Halfwave reads potentiostat text exports and analyses them entirely in this browser tab; no data is sent anywhere. Each number comes with the method and parameters used, so check peak picks on the plot before reporting them. The demo files are simulated by Halfwave's own simulator.</p>
        <button ref={close} type="button" onClick={hide} data-testid="safety-close">Close</button>
      </aside>
    </>
  );
}
