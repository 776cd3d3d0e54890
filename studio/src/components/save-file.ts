/** Saves a file the API sent, under a name of ours. */
export function saveFile(blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const anchor = document.createElement('a');
  anchor.href = url;
  anchor.download = name;
  anchor.click();
  // The click has started the download; the URL can go once the browser has taken it.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
