/**
 * Several analysis clients behind one: each request goes to the client with the fewest requests
 * in flight (ties to the first). Requests carry everything they need, so any worker can serve
 * any request; where the machine has cores to spare, a pool of two reads and analyses many files
 * side by side (spawn.ts decides how many).
 * A member given as a factory is started again when its worker stops on its own, and a request
 * the lost worker was doing is sent once more to a live one — except a file import, whose bytes
 * went to the lost worker (the store reads the file again).
 */
import type { AnalysisClient } from './client';
import { WorkerLostError } from './errors';

interface Slot {
  client: AnalysisClient;
  make: (() => AnalysisClient) | null;
  busy: number;
}

export function createPoolClient(members: Array<AnalysisClient | (() => AnalysisClient)>): AnalysisClient {
  if (members.length === 0) throw new Error('a client pool needs at least one client');
  const slots: Slot[] = members.map((m) => start(typeof m === 'function' ? m : null, typeof m === 'function' ? m() : m));

  function start(make: (() => AnalysisClient) | null, client: AnalysisClient): Slot {
    const slot: Slot = { client, make, busy: 0 };
    watch(slot);
    return slot;
  }

  function watch(slot: Slot): void {
    const current = slot.client;
    current.onLost?.(() => {
      // Replace only the client that was lost (a late signal from an older one changes nothing).
      if (slot.make && slot.client === current) {
        slot.client = slot.make();
        watch(slot);
      }
    });
  }

  const leastBusy = () => slots.reduce((best, s) => (s.busy < best.busy ? s : best), slots[0] as Slot);

  return {
    transport: slots[0]?.client.transport ?? 'worker',
    async request(type, input, options) {
      for (let attempt = 0; ; attempt++) {
        const slot = leastBusy();
        slot.busy++;
        try {
          return await slot.client.request(type, input, options);
        } catch (err) {
          if (!(err instanceof WorkerLostError) || type === 'import' || attempt > 0) throw err;
        } finally {
          slot.busy--;
        }
      }
    },
    dispose() {
      for (const s of slots) s.client.dispose();
    },
    crash() {
      for (const s of slots) s.client.crash?.();
    },
  };
}
