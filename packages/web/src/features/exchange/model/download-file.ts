import type { ExportFile } from "./exchange-files";

/** Saves an export through a temporary link (the browser's own download). */
export function downloadFile(file: ExportFile): void {
  const url = URL.createObjectURL(new Blob([file.text], { type: file.type }));
  const a = document.createElement("a");
  a.href = url;
  a.download = file.fileName;
  document.body.appendChild(a);
  a.click();
  a.remove();
  // Some browsers read the URL after click returns; give them time before revoking it.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
