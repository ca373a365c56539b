// Hands a file made in or fetched by the browser to the browser to save under its name.
export function saveFile(blob: Blob, fileName: string): void {
  const href = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = href;
  a.download = fileName;
  document.body.append(a);
  a.click();
  a.remove();
  // Let the browser start the save before the object URL goes.
  setTimeout(() => URL.revokeObjectURL(href), 10_000);
}
