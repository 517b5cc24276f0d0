/** Short bench-safety note and what the app is; defers to local rules and the safety officer. */
import { useEffect, useRef } from 'react';
import { halfwaveActions, useHalfwave } from '../../state/react';

export function SafetyDrawer() {
  const open = useHalfwave((s) => s.safetyOpen);
  const close = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (open) close.current?.focus();
  }, [open]);
  if (!open) return null;
  const hide = () => halfwaveActions().setView({ safetyOpen: false });
  return (
    <aside className="drawer" role="dialog" aria-modal="false" aria-labelledby="safety-title" data-testid="safety-drawer"
      onKeyDown={(e) => e.key === 'Escape' && hide()}>
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
  );
}
