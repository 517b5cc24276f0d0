/** Theory overlay per file: simulated in the worker from the fitted parameters (see theory.ts). */
import { CancelledError } from '../worker/errors';
import { planTheory } from './theory';
import { toUserError, type SliceCreator, type TheorySlice } from './types';

export const createTheorySlice: SliceCreator<TheorySlice> = (set, get, deps) => {
  let running: AbortController | null = null;
  return {
    theory: {},
    async simulateTheory(id) {
      const plan = planTheory(get(), id);
      if (!plan.ok) {
        set((s) => ({ theory: { ...s.theory, [id]: { status: 'error', curve: null, description: '', error: { code: 'NOT_DETERMINED', message: `No theory overlay: ${plan.reason}.` } } } }));
        return;
      }
      running?.abort();
      const ctrl = new AbortController();
      running = ctrl;
      set((s) => ({ theory: { ...s.theory, [id]: { status: 'running', curve: s.theory[id]?.curve ?? null, description: plan.description, error: null } } }));
      try {
        const curve = await deps.client.request('simulate', { params: plan.params }, { signal: ctrl.signal });
        set((s) => ({ theory: { ...s.theory, [id]: { status: 'ready', curve, description: plan.description, error: null } } }));
      } catch (err) {
        if (err instanceof CancelledError) return;
        set((s) => ({ theory: { ...s.theory, [id]: { status: 'error', curve: null, description: plan.description, error: toUserError(err) } } }));
      }
    },
  };
};
