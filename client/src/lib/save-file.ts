/** Hands a file to the browser's download, as if the person had followed a link to it. */
export function saveFile(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  document.body.append(a);
  a.click();
  a.remove();
  // Some browsers read the URL after click() returns; let them finish first.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
