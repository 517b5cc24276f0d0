/** Saves text as a file through a same-origin Blob URL (nothing is uploaded). */
export function downloadText(fileName: string, text: string, mime: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: mime }));
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** "2026-12-01T21-40" for file names. */
export function stamp(now = new Date()): string {
  return now.toISOString().slice(0, 16).replace(/:/g, '-');
}
