/** Hands a blob to the browser's download machinery under the given file name. */
export function downloadBlob(doc: Document, blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const anchor = doc.createElement('a');
  anchor.href = url;
  anchor.download = fileName;
  anchor.hidden = true;
  doc.body.append(anchor);
  anchor.click();
  anchor.remove();
  // The download has started from the URL by now, but some browsers read it lazily.
  setTimeout(() => URL.revokeObjectURL(url), 30_000);
}
