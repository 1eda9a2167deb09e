/** Browser downloads of text and data URLs. DOM only: call from event handlers. */

/** Saves `text` as a file named `filename`. */
export function downloadText(filename: string, text: string, mime = 'text/plain;charset=utf-8'): void {
  const url = URL.createObjectURL(new Blob([text], { type: mime }));
  try {
    downloadUrl(filename, url);
  } finally {
    setTimeout(() => URL.revokeObjectURL(url), 1000);
  }
}

/** Saves the resource at `url` (object or data URL) as `filename`. */
export function downloadUrl(filename: string, url: string): void {
  const a = document.createElement('a');
  a.href = url;
  a.download = filename;
  a.rel = 'noopener';
  document.body.append(a);
  a.click();
  a.remove();
}
