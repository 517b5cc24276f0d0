/** Saves text or a data URL as a file through a same-origin link (nothing is uploaded). */
export function downloadText(fileName: string, text: string, mime: string): void {
  downloadBlob(fileName, new Blob([text], { type: mime }));
}

export function downloadBlob(fileName: string, blob: Blob): void {
  const url = URL.createObjectURL(blob);
  downloadUrl(fileName, url);
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export function downloadUrl(fileName: string, url: string): void {
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  document.body.appendChild(a);
  a.click();
  a.remove();
}

/** "2026-12-01T21-40" for file names. */
export function stamp(now = new Date()): string {
  return now.toISOString().slice(0, 16).replace(/:/g, '-');
}

/** A file-name-safe form of a series or file name. */
export function safeName(name: string): string {
  return name.replace(/[^\w.-]+/g, '_');
}
