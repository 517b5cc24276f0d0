/**
 * A derived number that explains itself: hovering it, or giving it keyboard focus, shows the
 * formula used, its published source and the inputs with their values; Escape hides it again.
 */
import { useId, useState, type ReactNode } from 'react';
import type { Explanation } from '../../state/explain';

export function Explained({ explanation, children }: { explanation: Explanation | undefined; children: ReactNode }) {
  const id = useId();
  const [hidden, setHidden] = useState(false);
  if (!explanation) return <>{children}</>;
  return (
    <span className={`explained${hidden ? ' dismissed' : ''}`} onMouseLeave={() => setHidden(false)}>
      <button type="button" className="explain-term" aria-describedby={id} data-testid={`explain-${explanation.key}`}
        onBlur={() => setHidden(false)} onKeyDown={(e) => e.key === 'Escape' && setHidden(true)}>{children}</button>
      <span role="tooltip" id={id} className="explain-tip" data-testid={`explain-tip-${explanation.key}`}>
        <span className="tip-formula">{explanation.name}: {explanation.formula}</span>
        <span className="tip-source">Source: {explanation.source}</span>
        <span className="tip-inputs">{explanation.inputs.map(([k, v]) => `${k} = ${v}`).join(' · ')}</span>
        {explanation.note ? <span className="tip-note">{explanation.note}</span> : null}
      </span>
    </span>
  );
}
