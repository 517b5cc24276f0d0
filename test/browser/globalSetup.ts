/**
 * Serves the production build (dist/) on 127.0.0.1 with Vite's preview server for the browser
 * specs, and hands its address to them through Vitest's `provide`.
 */
import { preview } from 'vite';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const server = await preview({ preview: { host: '127.0.0.1', port: 0, strictPort: false, open: false }, logLevel: 'warn' });
  const address = server.httpServer.address();
  if (!address || typeof address === 'string') throw new Error('preview server has no TCP address');
  const baseUrl = `http://127.0.0.1:${address.port}/`;
  project.provide('baseUrl', baseUrl);
  return async () => {
    await new Promise<void>((resolve) => server.httpServer.close(() => resolve()));
  };
}
