/**
 * App-level commands the UI triggers that span several slices (session files), bound to the app
 * store. Failures become a notice in the store instead of an exception in a click handler.
 */
import { getAppStore } from './app';
import { MAX_SESSION_CHARS, SessionError } from '../io/session';
import { openSessionText, saveSessionText } from './sessionActions';

export function saveSession(includeRawData: boolean): Promise<string> {
  return saveSessionText(getAppStore(), includeRawData);
}

/** Opens a session file in place of the workspace; a file too large to be ours is refused unread. */
export async function loadSession(file: Blob): Promise<void> {
  const store = getAppStore();
  try {
    if (file.size > MAX_SESSION_CHARS * 2) {
      throw new SessionError('TOO_LARGE', `the file is ${(file.size / 1048576).toFixed(0)} MB; sessions up to ${MAX_SESSION_CHARS / 1048576} MB are opened`);
    }
    const waiting = await openSessionText(store, await file.text());
    store.setState({
      notice: waiting.length === 0
        ? 'Session opened in place of the workspace (Undo brings the previous one back).'
        : `Session opened in place of the workspace (Undo brings the previous one back). Load these files again to continue: ${waiting.join(', ')}.`,
    });
  } catch (err) {
    store.setState({ notice: `Could not open the session (nothing was changed): ${(err as Error).message}` });
  }
}
