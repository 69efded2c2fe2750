/**
 * A file download made in the page from text it already has: no file dialog or file-system access
 * is needed from the Node side, and it works the same in the desktop window and in browser mode.
 */
export function downloadText(fileName: string, text: string, type: string): void {
  const link = document.createElement('a');
  link.href = URL.createObjectURL(new Blob([text], { type }));
  link.download = fileName;
  link.click();
  // Released a moment later, once the browser has started the download.
  setTimeout(() => URL.revokeObjectURL(link.href), 1000);
}
