/** The series a view shows (the selected one, else the first), and the picker that changes it. */
import { halfwaveActions, useHalfwave, useHalfwaveShallow } from '../../state/react';

export function useShownSeries(): { groups: string[]; group: string | null } {
  const groups = useHalfwaveShallow((s) => s.groups());
  const chosen = useHalfwave((s) => s.selectedGroup);
  return { groups, group: chosen && groups.includes(chosen) ? chosen : (groups[0] ?? null) };
}

export function SeriesPicker({ groups, group, testId, onPick }: { groups: string[]; group: string | null; testId: string; onPick?: () => void }) {
  return (
    <label>
      Series{' '}
      <select value={group ?? ''} data-testid={testId} onChange={(e) => { onPick?.(); halfwaveActions().selectGroup(e.target.value); }}>
        {groups.map((g) => <option key={g} value={g}>{g}</option>)}
      </select>
    </label>
  );
}
