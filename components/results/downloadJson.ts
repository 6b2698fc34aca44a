export type DownloadSuffix = 'run' | 'result' | 'roots' | 'determinants' | 'orbital-hamiltonian' | 'basis-hamiltonian';

/** File names for the downloads: the run's title, made safe for a file system. */
export function downloadName(title: string | undefined, suffix: DownloadSuffix, extension: 'json' | 'csv' = 'json'): string {
  const base = (title ?? '').trim().toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'ketbook';
  return `${base}.${suffix}.${extension}`;
}

/** Save text through the browser's download (client only). */
export function saveText(text: string, fileName: string, type: string): void {
  const blob = new Blob([text], { type });
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1_000);
}

/** Save a JSON document through the browser's download (client only). */
export function saveJson(value: unknown, fileName: string): void {
  saveText(`${JSON.stringify(value, null, 2)}\n`, fileName, 'application/json');
}
