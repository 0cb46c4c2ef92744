/** Hands a file to the browser's download, from a Blob or a data URL. */

export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  downloadUrl(url, fileName);
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export function downloadUrl(url: string, fileName: string): void {
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
}

/** "courtyard-festoon-lights.sagwright.json" → "courtyard-festoon-lights". */
export function fileStem(fileName: string): string {
  return fileName.replace(/\.sagwright\.json$/, '');
}
