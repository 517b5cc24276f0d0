/** One-line notices (demo loaded, session loaded, autosave failure), dismissible. */
import { halfwaveActions, useHalfwave } from '../../state/react';

export function NoticeBar() {
  const notice = useHalfwave((s) => s.notice);
  if (!notice) return null;
  return (
    <div className="notice" role="status" data-testid="notice">
      <span>{notice}</span>
      <button type="button" className="icon" aria-label="Dismiss notice" onClick={() => halfwaveActions().setView({ notice: null })}>×</button>
    </div>
  );
}
