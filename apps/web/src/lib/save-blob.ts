/** Hands bytes fetched with the token to the browser as a download under the given name. */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // The click has started the download by the next task; the URL is no longer needed.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
