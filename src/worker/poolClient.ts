/**
 * Several analysis clients behind one: each request goes to the client with the fewest requests
 * in flight (ties to the first). Requests carry everything they need, so any worker can serve
 * any request; a pool of two keeps both cores busy while many files are read and analysed.
 */
import type { AnalysisClient } from './client';

export function createPoolClient(clients: AnalysisClient[]): AnalysisClient {
  if (clients.length === 0) throw new Error('a client pool needs at least one client');
  const busy = clients.map(() => 0);
  return {
    transport: clients[0]?.transport ?? 'worker',
    async request(type, input, options) {
      let k = 0;
      for (let i = 1; i < clients.length; i++) if ((busy[i] as number) < (busy[k] as number)) k = i;
      busy[k] = (busy[k] as number) + 1;
      try {
        return await (clients[k] as AnalysisClient).request(type, input, options);
      } finally {
        busy[k] = (busy[k] as number) - 1;
      }
    },
    dispose() {
      for (const c of clients) c.dispose();
    },
  };
}
