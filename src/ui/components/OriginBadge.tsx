/** Where a cell value came from (default, a file's header, entered), with the evidence on hover and focus. */
import type { CellOrigin } from '../../state/types';

const WORDS: Record<CellOrigin, string> = { default: 'default', header: 'from file', folder: 'from folder', entered: 'entered' };

export function OriginBadge({ origin, evidence, testId }: { origin: CellOrigin; evidence: string; testId?: string }) {
  return (
    <span className={`origin origin-${origin}`} tabIndex={0} title={evidence} aria-label={`${WORDS[origin]}: ${evidence}`} data-testid={testId} data-origin={origin}>
      {WORDS[origin]}
    </span>
  );
}
