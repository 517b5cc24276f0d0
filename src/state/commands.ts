/**
 * App-level commands the UI triggers that span several slices (session files), bound to the app
 * store. Failures become a notice in the store instead of an exception in a click handler.
 */
import { getAppStore } from './app';
import { loadSessionText, saveSessionText } from './sessionActions';

export function saveSession(includeRawData: boolean): Promise<string> {
  return saveSessionText(getAppStore(), includeRawData);
}

export async function loadSession(text: string): Promise<void> {
  const store = getAppStore();
  try {
    const waiting = await loadSessionText(store, text);
    store.setState({
      notice: waiting.length === 0
        ? 'Session loaded.'
        : `Session loaded. Load these files again to get their settings back: ${waiting.join(', ')}.`,
    });
  } catch (err) {
    store.setState({ notice: `Could not load the session: ${(err as Error).message}` });
  }
}
