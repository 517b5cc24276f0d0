/**
 * The demo voltammograms' text, all in one chunk: the app imports this module lazily, so the
 * demo reaches the page in one request instead of one per file, and only on a first visit.
 */
export const DEMO_FILES: Record<string, string> = import.meta.glob<string>('/demo-data/*.{csv,txt,tsv,dat}', { query: '?raw', import: 'default', eager: true });
