/**
 * The demo voltammograms shipped with the app (written by `npm run demo-data` from our own
 * simulator into demo-data/). Bundled same-origin by Vite and loaded lazily, never fetched from
 * another host.
 */
import type { FileInput } from './types';

const demoModules = import.meta.glob<string>('/demo-data/*.{csv,txt,tsv,dat}', { query: '?raw', import: 'default' });

export async function loadDemoInputs(): Promise<FileInput[]> {
  const paths = Object.keys(demoModules).sort();
  return Promise.all(paths.map(async (path) => {
    const load = demoModules[path] as () => Promise<string>;
    return { name: path.slice(path.lastIndexOf('/') + 1), data: await load() };
  }));
}
